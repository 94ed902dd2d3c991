import { MigrationError } from "umzug";
import { loadConfig } from "@server/config";
import { migrateDatabase, seedDatabase } from "@server/db/migrator";
import { createSequelize } from "@server/db/sequelize";

// Run by the bootstrap: `tsx server/tools/migrate.ts [--seed]`.
const config = loadConfig();
const sequelize = createSequelize(config.databaseUrl);
try {
  const applied = await migrateDatabase(sequelize);
  if (applied.length) console.log(`  applied ${applied.join(", ")}`);
  if (process.argv.includes("--seed") && config.demo) {
    const seeded = await seedDatabase(sequelize);
    if (seeded.length) console.log(`  seeded ${seeded.join(", ")}`);
  }
} catch (e) {
  // A MigrationError wraps huge objects: print only what a person needs.
  const cause = e instanceof MigrationError ? (e.cause as Error | undefined) : undefined;
  console.error(`✗ ${(e as Error).message}${cause ? `: ${cause.message}` : ""}`);
  process.exitCode = 1;
} finally {
  await sequelize.close();
}
