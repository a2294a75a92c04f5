import { afterAll, afterEach, beforeEach, vi } from 'vitest';
import { startStorageProxy } from '../support/storage-proxy.ts';
import { startTcpProxy } from '../support/tcp-proxy.ts';

// The app reaches the storage fake through a proxy the tests control (see
// storage-proxy.ts). It must be in place before any server module reads the
// configuration, hence the dynamic imports below.
const proxy = await startStorageProxy(process.env.S3_ENDPOINT!);
process.env.S3_ENDPOINT = proxy.url;
(globalThis as { storageProxy?: typeof proxy }).storageProxy = proxy;
// Likewise the mail server, through a TCP proxy the tests can switch off.
const smtp = new URL(process.env.SMTP_URL!);
const mailProxy = await startTcpProxy(smtp.hostname, Number(smtp.port));
process.env.SMTP_URL = `smtp://127.0.0.1:${mailProxy.port}`;
(globalThis as { mailProxy?: typeof mailProxy }).mailProxy = mailProxy;
const { closeDatabase } = await import('../../server/db/sequelize.ts');
const { closeMailer } = await import('../../server/lib/mailer.ts');
const { startJobs, stopJobs } = await import('../../server/lib/jobs.ts');
await import('../../server/lib/mail-queue.ts');
// Queued mail is sent by workers in this process, as the server's would be.
await startJobs({ work: true, pollingIntervalSeconds: 0.5 });

// An unexpected console.error or console.warn fails the test: broken
// behaviour must not pass quietly.
let spies: ReturnType<typeof vi.spyOn>[] = [];
beforeEach(() => {
  proxy.restore();
  mailProxy.up();
  spies = (['error', 'warn'] as const).map((level) =>
    vi.spyOn(console, level).mockImplementation((...args: unknown[]) => {
      throw new Error(`console.${level} was called: ${args.map(String).join(' ')}`);
    }),
  );
});
afterEach(() => {
  for (const s of spies) s.mockRestore();
});

afterAll(async () => {
  await stopJobs();
  closeMailer();
  await closeDatabase();
  await proxy.close();
  await mailProxy.close();
});
