import type { QueryInterface } from "sequelize";

/**
 * Read-only share links: a capability URL to one diagram's latest version (version_number NULL) or to one fixed
 * version. Only the SHA-256 of the token is stored, so a database leak hands out no working link.
 */
export async function up(queryInterface: QueryInterface): Promise<void> {
  await queryInterface.sequelize.query(`
    CREATE TABLE share_links (
      id UUID PRIMARY KEY DEFAULT gen_random_uuid(),
      diagram_id UUID NOT NULL REFERENCES diagrams(id) ON DELETE CASCADE,
      version_number INTEGER CHECK (version_number >= 1),
      token_hash TEXT NOT NULL UNIQUE,
      created_by TEXT REFERENCES users(id) ON DELETE SET NULL,
      created_at TIMESTAMPTZ NOT NULL DEFAULT now(),
      expires_at TIMESTAMPTZ,
      revoked_at TIMESTAMPTZ,
      last_opened_at TIMESTAMPTZ,
      times_opened INTEGER NOT NULL DEFAULT 0 CHECK (times_opened >= 0)
    );
    CREATE INDEX share_links_diagram_id ON share_links(diagram_id, created_at DESC);
  `);
}

export async function down(queryInterface: QueryInterface): Promise<void> {
  await queryInterface.sequelize.query("DROP TABLE share_links");
}
