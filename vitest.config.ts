import react from '@vitejs/plugin-react';
import { defineConfig } from 'vitest/config';

// Three projects: pure domain logic, the API against real services, and the
// React client in happy-dom. When this file exists Vite's own config is not
// read, so the React plugin is listed here too.
export default defineConfig({
  plugins: [react()],
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          environment: 'node',
          include: ['shared/**/*.test.ts', 'scripts/**/*.test.ts', 'seeders/**/*.test.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'api',
          environment: 'node',
          include: ['tests/api/**/*.test.ts', 'server/**/*.test.ts'],
          globalSetup: ['tests/setup/api-global-setup.ts'],
          setupFiles: ['tests/setup/api-setup.ts'],
          // One shared database; files run one after another.
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'client',
          environment: 'happy-dom',
          include: ['src/**/*.test.{ts,tsx}'],
          setupFiles: ['src/testing/setup-tests.ts'],
          testTimeout: 20_000,
        },
      },
    ],
  },
});
