// `npm test`: the whole suite on throwaway services. Starts PostgreSQL, the
// storage fake and the mail fake on free ports with data under a temporary
// folder, runs vitest (unit, API, client) and then Playwright against the
// built app in Debian's chromium, and ends with one line "N passed, N failed"
// totalled from the runners' JSON reports.
//   npm test                 everything
//   npm test -- vitest ARGS  only vitest, ARGS passed on (e.g. --project unit)
//   npm test -- e2e ARGS     only the browser tests
//   npm test -- typecheck    only tsc
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { freePort } from './services/free-port.ts';
import { PLAYWRIGHT, runNode, spawnNode, TSC, TSX, VITE, VITEST } from './services/run-node.ts';
import { startStack } from './services/stack.ts';

const [mode = 'all', ...passThrough] = process.argv.slice(2);
const runVitest = mode === 'all' || mode === 'vitest';
const runE2e = mode === 'all' || mode === 'e2e';
const runTypecheck = mode === 'all' || mode === 'typecheck';
const root = mkdtempSync(path.join(tmpdir(), 'pourscope-test-'));
const log = (line: string) => console.log(`› ${line}`);

type Tally = { suite: string; passed: number; failed: number; skipped: number; ran: boolean };
const tallies: Tally[] = [];

function readJson<T>(file: string): T | undefined {
  return existsSync(file) ? (JSON.parse(readFileSync(file, 'utf8')) as T) : undefined;
}

const appPort = await freePort();
const stack = await startStack({ dataRoot: root, throwaway: true, appPort, log });
const baseEnv = { ...stack.env, NODE_ENV: 'test', AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true' };
let server: ReturnType<typeof spawnNode> | undefined;
let exitCode = 0;

try {
  if (runTypecheck) {
    log('type-checking');
    const code = await runNode(TSC, ['--noEmit', '-p', 'tsconfig.json']);
    tallies.push({ suite: 'typecheck', passed: code === 0 ? 1 : 0, failed: code === 0 ? 0 : 1, skipped: 0, ran: true });
  }

  if (runVitest) {
    if ((await runNode(TSX, ['scripts/prepare-database.ts', '--no-seed'], { env: baseEnv })) !== 0) {
      throw new Error('migrating the test database failed');
    }
    const report = path.join(root, 'vitest.json');
    const code = await runNode(
      VITEST,
      ['run', '--reporter=default', '--reporter=json', `--outputFile.json=${report}`, ...(mode === 'vitest' ? passThrough : [])],
      { env: baseEnv },
    );
    const r = readJson<{ numPassedTests: number; numFailedTests: number; numPendingTests: number; numTodoTests: number }>(report);
    // A crash before the report counts as a failure, never as a pass.
    tallies.push({
      suite: 'vitest',
      passed: r?.numPassedTests ?? 0,
      failed: r ? r.numFailedTests + (code !== 0 && r.numFailedTests === 0 ? 1 : 0) : 1,
      skipped: (r?.numPendingTests ?? 0) + (r?.numTodoTests ?? 0),
      ran: true,
    });
  }

  if (runE2e) {
    log('building the client');
    if ((await runNode(VITE, ['build', '--logLevel', 'warn'], { env: baseEnv })) !== 0) throw new Error('client build failed');
    // The browser tests get their own database with the demo workshop loaded.
    const e2eUrl = stack.env.DATABASE_URL.replace(/\/[^/]+$/, '/pourscope_e2e');
    const admin = new pg.Client({ connectionString: stack.env.DATABASE_URL.replace(/\/[^/]+$/, '/postgres') });
    await admin.connect();
    await admin.query('CREATE DATABASE pourscope_e2e');
    await admin.end();
    const e2eEnv = { ...baseEnv, DATABASE_URL: e2eUrl, NODE_ENV: 'development', PORT: String(appPort) };
    // Seeded twice: the second run must find everything in place and add nothing
    // (tests/e2e/demo.e2e.ts counts the rows).
    for (let run = 0; run < 2; run++) {
      if ((await runNode(TSX, ['scripts/prepare-database.ts'], { env: e2eEnv })) !== 0) throw new Error('seeding the e2e database failed');
    }
    server = spawnNode(TSX, ['server/index.ts'], { env: { ...e2eEnv, LOG_LEVEL: 'warn' } });
    const baseUrl = `http://127.0.0.1:${appPort}`;
    const deadline = Date.now() + 30_000;
    while (!(await fetch(`${baseUrl}/api/ready`).then((r) => r.ok).catch(() => false))) {
      if (Date.now() > deadline || server.exitCode !== null) throw new Error('the app did not become ready for the browser tests');
      await new Promise((r) => setTimeout(r, 250));
    }
    const report = path.join(root, 'playwright.json');
    const code = await runNode(PLAYWRIGHT, ['test', ...(mode === 'e2e' ? passThrough : [])], {
      env: { ...e2eEnv, BASE_URL: baseUrl, PLAYWRIGHT_JSON_OUTPUT_NAME: report },
    });
    const r = readJson<{ stats: { expected: number; unexpected: number; flaky: number; skipped: number } }>(report);
    tallies.push({
      suite: 'playwright',
      passed: (r?.stats.expected ?? 0) + (r?.stats.flaky ?? 0),
      failed: r ? r.stats.unexpected + (code !== 0 && r.stats.unexpected === 0 ? 1 : 0) : 1,
      skipped: r?.stats.skipped ?? 0,
      ran: true,
    });
  }
} catch (error) {
  console.error(`\n${error instanceof Error ? error.message : String(error)}`);
  tallies.push({ suite: 'set-up', passed: 0, failed: 1, skipped: 0, ran: false });
} finally {
  if (server && server.exitCode === null) {
    const exited = new Promise((r) => server!.once('exit', r));
    server.kill('SIGTERM');
    await exited;
  }
  await stack.stop();
  rmSync(root, { recursive: true, force: true });
}

const passed = tallies.reduce((n, t) => n + t.passed, 0);
const failed = tallies.reduce((n, t) => n + t.failed, 0);
const skipped = tallies.reduce((n, t) => n + t.skipped, 0);
if (failed > 0 || passed === 0) exitCode = 1;
console.log(tallies.map((t) => `  ${t.suite}: ${t.passed} passed, ${t.failed} failed`).join('\n'));
console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
process.exit(exitCode);
