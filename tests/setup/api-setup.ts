import { afterAll, afterEach, beforeEach, vi } from 'vitest';
import { closeDatabase } from '../../server/db/sequelize.ts';
import { closeMailer } from '../../server/lib/mailer.ts';

// An unexpected console.error or console.warn fails the test: broken
// behaviour must not pass quietly.
let spies: ReturnType<typeof vi.spyOn>[] = [];
beforeEach(() => {
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
  closeMailer();
  await closeDatabase();
});
