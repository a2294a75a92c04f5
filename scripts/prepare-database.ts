// Migrates the database named by DATABASE_URL and, unless told not to, loads
// the demo workshop once. Run in its own process so the app's configuration
// is read from the environment the caller prepared.
import { closeDatabase, sequelize } from '../server/db/sequelize.ts';
import { stopJobs } from '../server/lib/jobs.ts';
import { createMigrator } from '../server/db/migrator.ts';
import { runSeeders } from '../seeders/run-seeders.ts';

const args = new Set(process.argv.slice(2));
try {
  const applied = await createMigrator(sequelize).up();
  if (applied.length) console.log(`› applied ${applied.length} migration${applied.length === 1 ? '' : 's'}`);
  if (!args.has('--no-seed')) {
    const seeded = await runSeeders(sequelize);
    if (seeded.length) console.log(`› loaded the demo workshop (${seeded.join(', ')})`);
  }
} catch (error) {
  // umzug wraps the database's own message; that is the useful line.
  const cause = (error as { cause?: { message?: string } }).cause;
  console.error(`Database set-up failed: ${(error as Error).message}${cause?.message ? `\n  ${cause.message}` : ''}`);
  process.exitCode = 1;
} finally {
  // Seeding through the services may queue mail; the queue's pool must close too.
  await stopJobs();
  await closeDatabase();
}
