// `npm run dev`: the same local services, the API in watch mode on PORT+1 and
// Vite's dev server with hot reload on PORT (default 5173), proxying /api.
import path from 'node:path';
import { startStack } from './services/stack.ts';
import { runNode, spawnNode, TSX, VITE } from './services/run-node.ts';

const apiPort = Number(process.env.API_PORT ?? 3001);
const webPort = Number(process.env.PORT ?? 5173);
const log = (line: string) => console.log(`› ${line}`);
const stack = await startStack({ dataRoot: path.resolve('.data'), throwaway: false, appPort: apiPort, log });
const env = { ...stack.env, PORT: String(apiPort), API_PORT: String(apiPort), APP_ORIGIN: `http://127.0.0.1:${webPort}` };

const children: ReturnType<typeof spawnNode>[] = [];
let shuttingDown = false;
async function shutdown(code: number) {
  if (shuttingDown) return;
  shuttingDown = true;
  await Promise.all(
    children
      .filter((c) => c.exitCode === null)
      .map((c) => new Promise((r) => { c.once('exit', r); c.kill('SIGTERM'); })),
  );
  await stack.stop();
  process.exit(code);
}
process.once('SIGINT', () => void shutdown(0));
process.once('SIGTERM', () => void shutdown(0));

if ((await runNode(TSX, ['scripts/prepare-database.ts'], { env })) !== 0) await shutdown(1);
children.push(spawnNode(TSX, ['watch', '--clear-screen=false', 'server/index.ts'], { env: { NODE_ENV: 'development', ...env } }));
children.push(spawnNode(VITE, ['--port', String(webPort), '--strictPort'], { env }));
for (const c of children) c.once('exit', (code) => void shutdown(code ?? 1));
log(`open http://127.0.0.1:${webPort}`);
