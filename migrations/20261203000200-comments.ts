import type { QueryInterface } from "sequelize";

/**
 * Review comments on a saved version: a thread is a root comment (thread_id NULL) on (diagram, version number),
 * optionally pinned to one block or wire of that version; replies point at their thread's root.
 */
export async function up(queryInterface: QueryInterface): Promise<void> {
  await queryInterface.sequelize.query(`
    CREATE TABLE comments (
      id UUID PRIMARY KEY DEFAULT gen_random_uuid(),
      diagram_id UUID NOT NULL REFERENCES diagrams(id) ON DELETE CASCADE,
      version_number INTEGER NOT NULL CHECK (version_number >= 1),
      thread_id UUID REFERENCES comments(id) ON DELETE CASCADE,
      pin JSONB,
      body TEXT NOT NULL CHECK (char_length(body) BETWEEN 1 AND 4000),
      author_id TEXT NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      resolved_at TIMESTAMPTZ,
      resolved_by TEXT REFERENCES users(id) ON DELETE SET NULL,
      created_at TIMESTAMPTZ NOT NULL DEFAULT now(),
      updated_at TIMESTAMPTZ NOT NULL DEFAULT now(),
      CHECK (thread_id IS NULL OR (pin IS NULL AND resolved_at IS NULL))
    );
    CREATE INDEX comments_version ON comments(diagram_id, version_number, created_at) WHERE thread_id IS NULL;
    CREATE INDEX comments_thread ON comments(thread_id, created_at) WHERE thread_id IS NOT NULL;
  `);
}

export async function down(queryInterface: QueryInterface): Promise<void> {
  await queryInterface.sequelize.query("DROP TABLE comments");
}
