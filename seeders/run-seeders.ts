import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import type { Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';

const SEEDERS_DIR = path.dirname(fileURLToPath(import.meta.url));

type SeederModule = { up: (p: { sequelize: Sequelize }) => Promise<void> };

/**
 * Runs the numbered seed files once each (recorded in seed_runs), so a second
 * `npm start` keeps the data as it is. Returns the names it ran.
 */
export async function runSeeders(sequelize: Sequelize): Promise<string[]> {
  const umzug = new Umzug({
    migrations: {
      glob: ['[0-9][0-9]-*.ts', { cwd: SEEDERS_DIR }],
      resolve: ({ name, path: file }) => ({
        name,
        up: async () => ((await import(pathToFileURL(file!).href)) as SeederModule).up({ sequelize }),
      }),
    },
    storage: new SequelizeStorage({ sequelize, tableName: 'seed_runs' }),
    context: {},
    logger: undefined,
  });
  return (await umzug.up()).map((m) => m.name.replace(/\.ts$/, ''));
}
