import type { Transaction } from "sequelize";
import { COUNTED_AUDIT_KINDS, type AuditKind } from "@shared/api/audit";
import { AuditEvent } from "@server/db/models/audit";

export interface AuditEntry {
  teamId: string;
  /** Who did it; null for someone without an account (a share link's reader). */
  actorId: string | null;
  kind: AuditKind;
  diagramId?: string | null;
  subject?: string | null;
  detail?: Record<string, unknown>;
}

/**
 * Adds one entry to the team's audit trail, inside the caller's transaction when it has one, so the trail and the
 * change it records are stored together or not at all. Counted kinds add 1 to their subject's row instead.
 * Example: recordAudit({ teamId, actorId: user.id, kind: "version.saved", diagramId, subject: "3" }, transaction).
 */
export async function recordAudit(entry: AuditEntry, transaction?: Transaction): Promise<void> {
  const row = {
    teamId: entry.teamId,
    actorId: entry.actorId,
    kind: entry.kind,
    diagramId: entry.diagramId ?? null,
    subject: entry.subject ?? null,
    detail: entry.detail ?? {},
  };
  if (!COUNTED_AUDIT_KINDS.includes(entry.kind)) {
    await AuditEvent.create(row, { transaction });
    return;
  }
  await AuditEvent.sequelize!.query(
    `INSERT INTO audit_events (team_id, actor_id, kind, diagram_id, subject, detail)
     VALUES (:teamId, :actorId, :kind, :diagramId, :subject, :detail)
     ON CONFLICT (kind, subject) WHERE kind = 'share_link.opened'
     DO UPDATE SET count = audit_events.count + 1, at = now()`,
    { replacements: { ...row, detail: JSON.stringify(row.detail) }, transaction },
  );
}
