import { z } from "zod";

/**
 * What the team's audit trail records. `subject` names the thing acted on in the kind's own terms: a version
 * number, a share link id, a user id, an invitation id, a comment id.
 */
export const AUDIT_KINDS = [
  "diagram.created",
  "diagram.imported",
  "version.saved",
  "version.restored",
  "share_link.created",
  "share_link.opened",
  "share_link.revoked",
  "member.role_changed",
  "member.removed",
  "invitation.sent",
  "invitation.accepted",
  "invitation.revoked",
  "comment.resolved",
  "comment.reopened",
] as const;
export const auditKindSchema = z.enum(AUDIT_KINDS);
export type AuditKind = z.infer<typeof auditKindSchema>;

/** Kinds counted on one row per subject (each further occurrence adds 1 to `count` and moves `at`). */
export const COUNTED_AUDIT_KINDS: readonly AuditKind[] = ["share_link.opened"];

/** The most events one page of the trail holds, and how many a page holds when the query does not say. */
export const AUDIT_PAGE_MAX = 100;
export const AUDIT_PAGE_DEFAULT = 50;

const DIAGRAM_ID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const CURSOR = /^(\d{1,17})\.(\d{1,18})$/;
const LIMIT_RULE = `limit is a whole number from 1 to ${AUDIT_PAGE_MAX}`;

/**
 * Where the next page of the trail starts: after the event stored at `atMicros` (microseconds since 1970, the
 * database's own precision) with id `id`. Clients treat its text as opaque and hand back `nextCursor` as given.
 */
export interface AuditCursor {
  atMicros: string;
  id: string;
}

/** The cursor's text: `auditCursorText({ atMicros: "1764756000123456", id: "42" })` → "1764756000123456.42". */
export const auditCursorText = (c: AuditCursor): string => `${c.atMicros}.${c.id}`;

/**
 * `GET /api/teams/:teamId/audit`'s query: filters by person (user id), kind and diagram, the page size and the
 * cursor of the page before. Example: `{ kind: "version.saved", limit: "20" }` → `{ kind, limit: 20 }`.
 */
export const auditQuerySchema = z.object({
  actor: z.string({ error: "actor is one user id" }).min(1, "actor is one user id").max(64, "actor is one user id").optional(),
  kind: z.enum(AUDIT_KINDS, { error: `kind is one of ${AUDIT_KINDS.join(", ")}` }).optional(),
  diagram: z.string({ error: "diagram is one diagram id" }).regex(DIAGRAM_ID, "diagram is one diagram id").optional(),
  limit: z.coerce.number({ error: LIMIT_RULE }).int(LIMIT_RULE).min(1, LIMIT_RULE).max(AUDIT_PAGE_MAX, LIMIT_RULE).default(AUDIT_PAGE_DEFAULT),
  before: z
    .string({ error: "before is the nextCursor of an earlier page" })
    .regex(CURSOR, "before is the nextCursor of an earlier page")
    .transform((text): AuditCursor => {
      const [, atMicros, id] = CURSOR.exec(text)!;
      return { atMicros, id };
    })
    .optional(),
});
export type AuditQuery = z.input<typeof auditQuerySchema>;
export type ParsedAuditQuery = z.output<typeof auditQuerySchema>;

/** One row of the trail as owners read it; `actor` or `diagram` is null once that person or diagram is gone. */
export const auditEventSchema = z.object({
  id: z.string(),
  at: z.string(),
  kind: auditKindSchema,
  actor: z.object({ id: z.string(), name: z.string() }).nullable(),
  diagram: z.object({ id: z.string(), title: z.string() }).nullable(),
  subject: z.string().nullable(),
  /** How many times it happened (more than 1 only for counted kinds). */
  count: z.number().int().min(1),
  detail: z.record(z.string(), z.unknown()),
});
export type AuditEventView = z.infer<typeof auditEventSchema>;

/** A page of the trail, newest first; `nextCursor` is null on the last page. */
export const auditPageSchema = z.object({ events: z.array(auditEventSchema), nextCursor: z.string().nullable() });
export type AuditPage = z.infer<typeof auditPageSchema>;
