import net from 'node:net';

/**
 * A TCP pass-through a test can switch off, to take a service (here the mail
 * server) away and bring it back: while down, new connections are refused
 * and open ones are cut.
 */
export type TcpProxy = { port: number; down: () => void; up: () => void; close: () => Promise<void> };

export async function startTcpProxy(targetHost: string, targetPort: number): Promise<TcpProxy> {
  let isDown = false;
  const sockets = new Set<net.Socket>();
  const server = net.createServer((client) => {
    if (isDown) {
      client.destroy();
      return;
    }
    const upstream = net.connect(targetPort, targetHost);
    for (const s of [client, upstream]) {
      sockets.add(s);
      s.on('close', () => sockets.delete(s));
      s.on('error', () => {
        client.destroy();
        upstream.destroy();
      });
    }
    client.pipe(upstream).pipe(client);
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const port = (server.address() as net.AddressInfo).port;
  return {
    port,
    down: () => {
      isDown = true;
      for (const s of sockets) s.destroy();
    },
    up: () => {
      isDown = false;
    },
    close: () =>
      new Promise<void>((resolve) => {
        for (const s of sockets) s.destroy();
        server.close(() => resolve());
      }),
  };
}
