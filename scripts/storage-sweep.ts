// `npm run storage:sweep [-- --dry-run]`: deletes objects that no photo row
// references and lists rows whose objects are missing. Against the services
// named in the environment, or the local ones under .data/ when none are.
import path from 'node:path';
import { startStack } from './services/stack.ts';

const dryRun = process.argv.includes('--dry-run');
const stack = process.env.DATABASE_URL
  ? undefined
  : await startStack({ dataRoot: path.resolve('.data'), throwaway: false, appPort: Number(process.env.PORT ?? 3000) });
if (stack) Object.assign(process.env, stack.env);

const { sweepStorage } = await import('../server/modules/photos/storage-sweep.ts');
const { closeDatabase } = await import('../server/db/sequelize.ts');
try {
  const report = await sweepStorage({ dryRun });
  console.log(`objects in the store: ${report.objectsSeen}`);
  console.log(`objects no row references: ${report.orphansFound.length}${dryRun ? ' (dry run: kept)' : `, deleted ${report.orphansDeleted}`}`);
  for (const key of report.orphansFound) console.log(`  ${key}`);
  console.log(`rows whose objects are missing: ${report.rowsMissingObjects.length}`);
  for (const r of report.rowsMissingObjects) console.log(`  photo ${r.photoId}: ${r.key}`);
  process.exitCode = report.rowsMissingObjects.length ? 2 : 0;
} finally {
  await closeDatabase();
  await stack?.stop();
}
