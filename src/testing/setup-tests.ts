import '@testing-library/jest-dom/vitest';
import { cleanup, configure } from '@testing-library/react';
import { afterEach, beforeEach, vi, type MockInstance } from 'vitest';

// findBy/waitFor wait up to 5 s: on a loaded 2-core machine the first render
// of a lazy page can take longer than the library's default second.
configure({ asyncUtilTimeout: 5_000 });

// A test that makes React (or our code) call console.error fails: broken
// renders, act() warnings and unhandled requests must not pass quietly.
let consoleError: MockInstance<typeof console.error>;

beforeEach(() => {
  consoleError = vi.spyOn(console, 'error');
});

afterEach(() => {
  cleanup();
  const calls = consoleError.mock.calls;
  consoleError.mockRestore();
  vi.unstubAllGlobals();
  localStorage.clear();
  document.documentElement.className = '';
  if (calls.length > 0) {
    const text = calls.map((args) => args.map((a) => (a instanceof Error ? a.message : String(a))).join(' ')).join('\n');
    throw new Error(`console.error was called during the test:\n${text}`);
  }
});
