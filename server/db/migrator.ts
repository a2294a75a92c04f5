import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import type { QueryInterface, Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';

const MIGRATIONS_DIR = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../migrations');

type MigrationModule = {
  up: (p: { context: QueryInterface }) => Promise<void>;
  down: (p: { context: QueryInterface }) => Promise<void>;
};

/**
 * umzug over the TypeScript files in migrations/. Each file is loaded with a
 * dynamic import from here, which works under tsx and under vitest alike
 * (umzug's own loader does not know .ts).
 */
export function createMigrator(sequelize: Sequelize) {
  return new Umzug<QueryInterface>({
    migrations: {
      glob: ['*.ts', { cwd: MIGRATIONS_DIR, ignore: ['*.test.ts', '*.d.ts'] }],
      resolve: ({ name, path: file, context }) => ({
        name,
        up: async () => ((await import(pathToFileURL(file!).href)) as MigrationModule).up({ context }),
        down: async () => ((await import(pathToFileURL(file!).href)) as MigrationModule).down({ context }),
      }),
    },
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}
