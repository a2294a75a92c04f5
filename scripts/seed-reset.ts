// `npm run seed:reset`: drops every table in the local database, migrates
// afresh and loads the demo workshop again. The bucket's objects stay; the
// storage sweep removes those no row references any more.
import path from 'node:path';
import pg from 'pg';
import { startStack } from './services/stack.ts';
import { runNode, TSX } from './services/run-node.ts';

const stack = await startStack({ dataRoot: path.resolve('.data'), throwaway: false, appPort: Number(process.env.PORT ?? 3000) });
try {
  const client = new pg.Client({ connectionString: stack.env.DATABASE_URL });
  await client.connect();
  await client.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public;');
  await client.end();
  const code = await runNode(TSX, ['scripts/prepare-database.ts'], { env: stack.env });
  process.exitCode = code;
} finally {
  await stack.stop();
}
