import type { Server } from 'node:http';
import { config } from './config.ts';
import { createApp } from './app.ts';
import { closeDatabase, sequelize } from './db/sequelize.ts';
import { logger } from './lib/logger.ts';
import { startJobs, stopJobs } from './lib/jobs.ts';
import './lib/mail-queue.ts';
import { closeMailer } from './lib/mailer.ts';
import { drainObjectDeletions } from './modules/photos/photos-service.ts';

/** Starts the HTTP server; resolves once it listens. */
export async function startServer(): Promise<{ server: Server; stop: () => Promise<void> }> {
  const cfg = config();
  await sequelize.authenticate();
  await startJobs({ work: true });
  const handle = createApp();
  const server = await new Promise<Server>((resolve, reject) => {
    const s = handle.app.listen(cfg.http.port, cfg.http.host, () => resolve(s));
    s.once('error', reject);
  });
  server.keepAliveTimeout = 5_000;
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : cfg.http.port;
  logger.info({ port }, `Pourscope is serving on http://${cfg.http.host}:${port}`);

  // Objects of deleted photos are removed from the store in the background,
  // and retried while the store is away.
  const sweeper = setInterval(() => void drainObjectDeletions().catch(() => {}), 60_000);
  sweeper.unref();

  let stopping: Promise<void> | undefined;
  const stop = () => {
    // Finish requests in flight, then close the pools.
    clearInterval(sweeper);
    stopping ??= new Promise<void>((resolve) => {
      server.close(() => resolve());
      server.closeIdleConnections();
      setTimeout(() => server.closeAllConnections(), 4_000).unref();
    }).then(async () => {
      await handle.close();
      await stopJobs();
      closeMailer();
      await closeDatabase();
    });
    return stopping;
  };
  return { server, stop };
}

const isMain = import.meta.url === `file://${process.argv[1]}`;
if (isMain) {
  process.on('unhandledRejection', (err) => {
    logger.fatal({ err }, 'unhandled rejection');
    process.exit(1);
  });
  const { stop } = await startServer().catch((err: unknown) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  });
  for (const signal of ['SIGINT', 'SIGTERM'] as const) {
    process.once(signal, () => void stop().then(() => process.exit(0)));
  }
}
