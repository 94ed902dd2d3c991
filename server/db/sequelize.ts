import { Sequelize } from "sequelize";
import { initModels } from "@server/db/models/init";

/** One Sequelize instance per process, its models registered. */
export function createSequelize(databaseUrl: string): Sequelize {
  const sequelize = new Sequelize(databaseUrl, {
    dialect: "postgres",
    logging: false,
    pool: { max: 10, min: 0, idle: 10_000, acquire: 5_000 },
    define: { underscored: true },
  });
  initModels(sequelize);
  return sequelize;
}
