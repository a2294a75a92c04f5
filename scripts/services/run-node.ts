import { spawn, type ChildProcess } from 'node:child_process';

/** Runs a Node script from node_modules (no npx: its pid is not the real process). */
export function runNode(
  script: string,
  args: string[],
  opts: { env?: Record<string, string>; stdio?: 'inherit' | 'pipe' } = {},
): Promise<number> {
  const child = spawnNode(script, args, opts);
  return new Promise((resolve) => child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0))));
}

export function spawnNode(
  script: string,
  args: string[],
  opts: { env?: Record<string, string>; stdio?: 'inherit' | 'pipe' } = {},
): ChildProcess {
  return spawn(process.execPath, [script, ...args], {
    stdio: opts.stdio ?? 'inherit',
    env: { ...process.env, ...opts.env },
  });
}

export const TSX = 'node_modules/tsx/dist/cli.mjs';
export const TSC = 'node_modules/typescript/bin/tsc';
export const VITE = 'node_modules/vite/bin/vite.js';
export const VITEST = 'node_modules/vitest/vitest.mjs';
export const PLAYWRIGHT = 'node_modules/@playwright/test/cli.js';
