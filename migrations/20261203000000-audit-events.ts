import type { QueryInterface } from "sequelize";

/**
 * The team's audit trail: one row per thing done (who, what, when, on which diagram). Opening a share link is
 * counted on one row per link (`count`, `at` = last opened), so a busy link does not flood the trail.
 */
export async function up(queryInterface: QueryInterface): Promise<void> {
  await queryInterface.sequelize.query(`
    CREATE TABLE audit_events (
      id BIGSERIAL PRIMARY KEY,
      team_id UUID NOT NULL REFERENCES teams(id) ON DELETE CASCADE,
      actor_id TEXT REFERENCES users(id) ON DELETE SET NULL,
      kind TEXT NOT NULL,
      diagram_id UUID REFERENCES diagrams(id) ON DELETE SET NULL,
      subject TEXT,
      detail JSONB NOT NULL DEFAULT '{}',
      count INTEGER NOT NULL DEFAULT 1 CHECK (count >= 1),
      at TIMESTAMPTZ NOT NULL DEFAULT now()
    );
    CREATE INDEX audit_events_team_at ON audit_events(team_id, at DESC, id DESC);
    CREATE UNIQUE INDEX audit_events_counted ON audit_events(kind, subject) WHERE kind = 'share_link.opened';
  `);
}

export async function down(queryInterface: QueryInterface): Promise<void> {
  await queryInterface.sequelize.query("DROP TABLE audit_events");
}
