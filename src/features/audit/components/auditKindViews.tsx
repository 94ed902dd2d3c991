import type { ReactNode } from "react";
import type { AuditEventView, AuditKind } from "@shared/api/audit";

/** What a sentence about an event may refer to: the diagram, as a link when it still exists. */
export interface Refs {
  diagram: ReactNode;
}

interface KindView {
  /** The kind's name in the kind filter. */
  name: string;
  /** What happened, in plain words after the person's name: "saved v3 of Servo loop". */
  what: (e: AuditEventView, refs: Refs) => ReactNode;
}

// Details were written by the server when the event happened; an older row may lack a field, so each is read with care.
const text = (e: AuditEventView, key: string, missing = "?"): string => {
  const v = e.detail[key];
  return typeof v === "string" || typeof v === "number" ? String(v) : missing;
};
const role = (e: AuditEventView, key: string) => text(e, key, "member");
const linkTarget = (e: AuditEventView) => (typeof e.detail.version === "number" ? `v${e.detail.version}` : "the latest version");

/** Every audit kind's filter name and sentence; a `Record` over the kinds, so a new kind cannot be left out. */
export const AUDIT_KIND_VIEWS: Record<AuditKind, KindView> = {
  "diagram.created": { name: "Diagram created", what: (_e, r) => <>created {r.diagram}</> },
  "diagram.imported": { name: "Diagram imported", what: (e, r) => <>imported {r.diagram} from {text(e, "fileName")}</> },
  "version.saved": { name: "Version saved", what: (e, r) => <>saved v{e.subject} of {r.diagram}</> },
  "version.restored": { name: "Version restored", what: (e, r) => <>restored v{text(e, "from")} of {r.diagram} as v{e.subject}</> },
  "share_link.created": { name: "Share link created", what: (e, r) => <>created a share link to {linkTarget(e)} of {r.diagram}</> },
  "share_link.opened": { name: "Share link opened", what: (e, r) => <>share link to {r.diagram} opened {e.count}×</> },
  "share_link.revoked": { name: "Share link revoked", what: (_e, r) => <>revoked a share link to {r.diagram}</> },
  "member.role_changed": {
    name: "Role changed",
    what: (e) => <>changed {text(e, "name")}&apos;s role from {role(e, "from")} to {role(e, "to")}</>,
  },
  "member.removed": {
    name: "Member removed or left",
    what: (e) => (e.detail.left === true ? <>left the team</> : <>removed {text(e, "name")} ({role(e, "role")}) from the team</>),
  },
  "invitation.sent": { name: "Invitation sent", what: (e) => <>invited {text(e, "email")} as {role(e, "role")}</> },
  "invitation.accepted": { name: "Invitation accepted", what: (e) => <>accepted the invitation and joined as {role(e, "role")}</> },
  "invitation.revoked": { name: "Invitation revoked", what: (e) => <>revoked the invitation of {text(e, "email")}</> },
  "comment.resolved": { name: "Comment resolved", what: (e, r) => <>resolved a comment thread on v{text(e, "version")} of {r.diagram}</> },
  "comment.reopened": { name: "Comment reopened", what: (e, r) => <>reopened a comment thread on v{text(e, "version")} of {r.diagram}</> },
};

/** Who did it: the person's name, or who they were once their account is gone. */
export const actorName = (e: AuditEventView): string =>
  e.actor?.name ?? (e.kind === "share_link.opened" ? "Readers of the link" : "A former member");
