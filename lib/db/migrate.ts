import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { Umzug, SequelizeStorage, type MigrationParams } from 'umzug';
import type { QueryInterface, Sequelize } from 'sequelize';
import { connectDatabase } from './connection';

export type MigrationContext = { queryInterface: QueryInterface; sequelize: Sequelize };
export type Migration = (params: MigrationParams<MigrationContext>) => Promise<void>;

type MigrationModule = { up: Migration; down: Migration };

/** Umzug gives every globbed migration a path; a missing one is a programming error. */
function migrationFile(file: string | undefined, name: string): string {
  if (file === undefined) throw new Error(`migration ${name} has no file path`);
  return file;
}

/**
 * Umzug over migrations/*.ts. Its default loader uses require(), which cannot
 * load TypeScript under vitest; a dynamic import() works under tsx and vitest.
 */
export function createMigrator(sequelize: Sequelize, migrationsDir = path.resolve(process.cwd(), 'migrations')) {
  return new Umzug<MigrationContext>({
    migrations: {
      glob: ['*.ts', { cwd: migrationsDir, ignore: ['*.d.ts', '*.test.ts'] }],
      resolve: ({ name, path: file, context }) => {
        const load = async (): Promise<MigrationModule> =>
          (await import(pathToFileURL(migrationFile(file, name)).href)) as MigrationModule;
        return {
          name: name.replace(/\.ts$/, ''),
          up: async (params) => (await load()).up({ ...params, context }),
          down: async (params) => (await load()).down({ ...params, context }),
        };
      },
    },
    context: { queryInterface: sequelize.getQueryInterface(), sequelize },
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

/** Applies every pending migration; returns the names applied. */
export async function migrateUp(): Promise<string[]> {
  const sequelize = await connectDatabase();
  const applied = await createMigrator(sequelize).up();
  return applied.map((m) => m.name);
}
