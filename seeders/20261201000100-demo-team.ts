import { randomUUID } from "node:crypto";
import type { QueryInterface } from "sequelize";
import { generateIdFromEntropySize } from "lucia";
import { hashPassword } from "@server/auth/password";
import { DEMO_PASSWORD, DEMO_TEAM, DEMO_USERS } from "@server/db/demoAccounts";
import { demoDiagrams } from "@server/db/demoDiagrams";
import type { CheckedResult } from "@shared/api/versions";
import { reduceDocument } from "@shared/reduce/reduceDiagram";

/** The same check a save runs, so demo versions carry their result like every other version. */
function checked(document: unknown): CheckedResult {
  const started = performance.now();
  const outcome = reduceDocument(document);
  const engineMs = Math.round(performance.now() - started);
  return outcome.ok ? { ok: true, result: outcome.result, engineMs } : { ok: false, problems: outcome.problems, engineMs };
}

/** The demo: an invented paper mill's drives team, three people (owner, editor, viewer) and a few loops. */
export async function up(queryInterface: QueryInterface): Promise<void> {
  const now = new Date();
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const users = DEMO_USERS.map((u) => ({ id: generateIdFromEntropySize(10), email: u.email, name: u.name, password_hash: passwordHash, created_at: now, updated_at: now }));
  const teamId = randomUUID();
  await queryInterface.sequelize.transaction(async (transaction) => {
    await queryInterface.bulkInsert("users", users, { transaction });
    await queryInterface.bulkInsert("teams", [{ id: teamId, name: DEMO_TEAM, created_at: now, updated_at: now }], { transaction });
    await queryInterface.bulkInsert(
      "memberships",
      users.map((u, i) => ({ team_id: teamId, user_id: u.id, role: DEMO_USERS[i].role, created_at: now, updated_at: now })),
      { transaction },
    );
    for (const [i, d] of demoDiagrams.entries()) {
      const id = randomUUID();
      const author = users[i % 2].id; // the owner and the editor take turns
      await queryInterface.bulkInsert("diagrams", [{ id, team_id: teamId, title: d.title, description: d.description, created_by: author, created_at: now, updated_at: now }], { transaction });
      await queryInterface.bulkInsert(
        "diagram_versions",
        [{ id: randomUUID(), diagram_id: id, number: 1, document: JSON.stringify(d.document), result: JSON.stringify(checked(d.document)), message: "First sketch", created_by: author, created_at: now }],
        { transaction },
      );
    }
  });
}

export async function down(queryInterface: QueryInterface): Promise<void> {
  await queryInterface.sequelize.query("DELETE FROM teams WHERE name = :name", { replacements: { name: DEMO_TEAM } });
  await queryInterface.sequelize.query("DELETE FROM users WHERE email IN (:emails)", { replacements: { emails: DEMO_USERS.map((u) => u.email) } });
}
