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
