import http from 'node:http';
import type { AddressInfo } from 'node:net';

/**
 * A pass-through HTTP proxy between the app and the storage fake, so a test
 * can take the object store away at an exact moment: after N more requests,
 * every later one has its connection cut, as when the store goes down
 * mid-upload. Headers pass unchanged, so the SDK's signatures still match.
 */
export type StorageProxy = {
  url: string;
  /** Requests forwarded so far, by method. */
  counts: Record<string, number>;
  /** Let `n` more requests through, then cut every connection until restore(). */
  failAfter: (n: number) => void;
  restore: () => void;
  close: () => Promise<void>;
};

export async function startStorageProxy(target: string): Promise<StorageProxy> {
  const upstream = new URL(target);
  let allowance = Number.POSITIVE_INFINITY;
  const counts: Record<string, number> = {};
  const server = http.createServer((req, res) => {
    if (allowance <= 0) {
      req.socket.destroy();
      return;
    }
    allowance -= 1;
    counts[req.method ?? 'GET'] = (counts[req.method ?? 'GET'] ?? 0) + 1;
    const forward = http.request(
      { hostname: upstream.hostname, port: upstream.port, method: req.method, path: req.url, headers: req.headers },
      (up) => {
        res.writeHead(up.statusCode ?? 502, up.headers);
        up.pipe(res);
      },
    );
    forward.on('error', () => res.destroy());
    req.pipe(forward);
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}`,
    counts,
    failAfter: (n) => {
      allowance = n;
    },
    restore: () => {
      allowance = Number.POSITIVE_INFINITY;
    },
    close: () =>
      new Promise<void>((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}
