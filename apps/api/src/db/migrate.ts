import { readdirSync } from "node:fs";
import path from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import type { QueryInterface, Sequelize } from "sequelize";
import { SequelizeStorage, Umzug } from "umzug";

export interface MigrationModule {
  up(context: { queryInterface: QueryInterface; sequelize: Sequelize }): Promise<void>;
  down(context: { queryInterface: QueryInterface; sequelize: Sequelize }): Promise<void>;
}

const migrationsDir = path.join(path.dirname(fileURLToPath(import.meta.url)), "migrations");

/** Migration files are `NNNN-name.ts` (foundation 0001–0009, domain 0010–0049, peril 0050+). */
function migrationFiles(): string[] {
  return readdirSync(migrationsDir)
    .filter((name) => /^\d{4}-[a-z0-9-]+\.(ts|js)$/.test(name) && !name.endsWith(".d.ts"))
    .sort();
}

export function createMigrator(sequelize: Sequelize): Umzug<{ queryInterface: QueryInterface; sequelize: Sequelize }> {
  return new Umzug({
    migrations: migrationFiles().map((file) => {
      const name = file.replace(/\.(ts|js)$/, "");
      const load = async (): Promise<MigrationModule> => (await import(pathToFileURL(path.join(migrationsDir, file)).href)) as MigrationModule;
      return {
        name,
        up: async ({ context }) => (await load()).up(context),
        down: async ({ context }) => (await load()).down(context),
      };
    }),
    context: { queryInterface: sequelize.getQueryInterface(), sequelize },
    storage: new SequelizeStorage({ sequelize, tableName: "schema_migrations" }),
    logger: undefined,
  });
}

/** Applies every pending migration in order; running it again is a no-op. Returns the names applied. */
export async function migrate(sequelize: Sequelize): Promise<string[]> {
  const applied = await createMigrator(sequelize).up();
  return applied.map((m) => m.name);
}
