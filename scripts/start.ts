// `npm start`: the local services, the database with the demo workshop, the
// built client, and the app on http://127.0.0.1:3000 (PORT overrides).
// Ctrl-C or SIGTERM stops everything this started.
import path from 'node:path';
import { startStack } from './services/stack.ts';
import { runNode, spawnNode, TSX, VITE } from './services/run-node.ts';

const port = Number(process.env.PORT ?? 3000);
const log = (line: string) => console.log(`› ${line}`);
const stack = await startStack({ dataRoot: path.resolve('.data'), throwaway: false, appPort: port, log });

let shuttingDown = false;
let app: ReturnType<typeof spawnNode> | undefined;
async function shutdown(code: number) {
  if (shuttingDown) return;
  shuttingDown = true;
  log('stopping');
  if (app && app.exitCode === null) {
    const exited = new Promise((r) => app!.once('exit', r));
    app.kill('SIGTERM');
    await exited;
  }
  await stack.stop();
  process.exit(code);
}
process.once('SIGINT', () => void shutdown(0));
process.once('SIGTERM', () => void shutdown(0));

try {
  if ((await runNode(TSX, ['scripts/prepare-database.ts'], { env: stack.env })) !== 0) throw new Error('database set-up failed');
  log('building the client');
  if ((await runNode(VITE, ['build', '--logLevel', 'warn'], { env: stack.env })) !== 0) throw new Error('client build failed');
  app = spawnNode(TSX, ['server/index.ts'], { env: { NODE_ENV: process.env.NODE_ENV ?? 'development', ...stack.env } });
  app.once('exit', (code) => void shutdown(code ?? 1));
  log(`open http://127.0.0.1:${port} (demo accounts are listed in README.md); Ctrl-C stops`);
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  await shutdown(1);
}
