import { readdirSync } from "node:fs";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { Sequelize } from "sequelize";
import { SequelizeStorage, Umzug } from "umzug";

type Step = { up: (qi: unknown, s: typeof Sequelize) => Promise<void>; down?: (qi: unknown, s: typeof Sequelize) => Promise<void> };

function umzugFor(sequelize: Sequelize, folder: "migrations" | "seeders", table: string) {
  const dir = join(process.cwd(), folder);
  const files = readdirSync(dir).filter((f) => f.endsWith(".ts")).sort();
  return new Umzug({
    migrations: files.map((file) => ({
      name: file,
      up: async () => ((await import(pathToFileURL(join(dir, file)).href)) as Step).up(sequelize.getQueryInterface(), Sequelize),
      down: async () => ((await import(pathToFileURL(join(dir, file)).href)) as Step).down?.(sequelize.getQueryInterface(), Sequelize),
    })),
    storage: new SequelizeStorage({ sequelize, tableName: table }),
    logger: undefined,
  });
}

/** Applies pending migrations (top-level migrations/); returns the names applied. */
export async function migrateDatabase(sequelize: Sequelize): Promise<string[]> {
  return (await umzugFor(sequelize, "migrations", "SequelizeMeta").up()).map((m) => m.name);
}

/** Applies pending seeders (top-level seeders/), each once. */
export async function seedDatabase(sequelize: Sequelize): Promise<string[]> {
  return (await umzugFor(sequelize, "seeders", "SequelizeData").up()).map((m) => m.name);
}
