import { QueryTypes } from "sequelize";
import { auditCursorText, type AuditEventView, type AuditPage, type ParsedAuditQuery } from "@shared/api/audit";
import { AuditEvent } from "@server/db/models/audit";

interface Row {
  id: string;
  at: Date;
  at_micros: string;
  kind: AuditEventView["kind"];
  actor_id: string | null;
  actor_name: string | null;
  diagram_id: string | null;
  diagram_title: string | null;
  subject: string | null;
  count: number;
  detail: Record<string, unknown>;
}

const view = (r: Row): AuditEventView => ({
  id: r.id,
  at: r.at.toISOString(),
  kind: r.kind,
  actor: r.actor_id !== null ? { id: r.actor_id, name: r.actor_name ?? "" } : null,
  diagram: r.diagram_id !== null ? { id: r.diagram_id, title: r.diagram_title ?? "" } : null,
  subject: r.subject,
  count: r.count,
  detail: r.detail,
});

/**
 * One page of a team's trail, newest first, filtered by person, kind and diagram. Keyset pagination on (at, id)
 * (the index audit_events_team_at), never OFFSET: a page costs the same however deep it is, and rows added
 * meanwhile do not shift later pages. The cursor carries `at` in microseconds, the column's own precision, because
 * a JavaScript Date would round it to milliseconds and skip or repeat rows stored within the same millisecond.
 */
export async function listAuditEvents(teamId: string, query: ParsedAuditQuery): Promise<AuditPage> {
  const where = ["e.team_id = :teamId"];
  if (query.actor !== undefined) where.push("e.actor_id = :actor");
  if (query.kind !== undefined) where.push("e.kind = :kind");
  if (query.diagram !== undefined) where.push("e.diagram_id = :diagram");
  if (query.before !== undefined)
    where.push("(e.at, e.id) < (timestamptz 'epoch' + CAST(:beforeMicros AS bigint) * interval '1 microsecond', CAST(:beforeId AS bigint))");
  const rows = await AuditEvent.sequelize!.query<Row>(
    `SELECT e.id::text AS id, e.at, (extract(epoch FROM e.at) * 1000000)::bigint::text AS at_micros, e.kind,
            e.actor_id, u.name AS actor_name, e.diagram_id, d.title AS diagram_title, e.subject, e.count, e.detail
       FROM audit_events e
       LEFT JOIN users u ON u.id = e.actor_id
       LEFT JOIN diagrams d ON d.id = e.diagram_id
      WHERE ${where.join(" AND ")}
      ORDER BY e.at DESC, e.id DESC
      LIMIT :take`,
    {
      type: QueryTypes.SELECT,
      replacements: {
        teamId,
        actor: query.actor ?? null,
        kind: query.kind ?? null,
        diagram: query.diagram ?? null,
        beforeMicros: query.before?.atMicros ?? null,
        beforeId: query.before?.id ?? null,
        // One more than asked tells whether another page follows without a second count query.
        take: query.limit + 1,
      },
    },
  );
  const page = rows.slice(0, query.limit);
  const last = page.at(-1);
  return {
    events: page.map(view),
    nextCursor: rows.length > query.limit && last ? auditCursorText({ atMicros: last.at_micros, id: last.id }) : null,
  };
}
