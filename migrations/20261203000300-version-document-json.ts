import type { QueryInterface } from "sequelize";

/**
 * A version's document is stored as the JSON text it was saved with (type JSON, not JSONB): JSONB reorders object
 * keys (shortest first), and the order of a document's parameters is the order its author declared them in.
 */
export async function up(queryInterface: QueryInterface): Promise<void> {
  await queryInterface.sequelize.query("ALTER TABLE diagram_versions ALTER COLUMN document TYPE JSON USING document::json");
}

export async function down(queryInterface: QueryInterface): Promise<void> {
  await queryInterface.sequelize.query("ALTER TABLE diagram_versions ALTER COLUMN document TYPE JSONB USING document::jsonb");
}
