import type { InvitationPreview } from "@shared/api/teams";
import { formatDateTime, roleLabel } from "@/lib/format";

/** What the invitation offers: which team, from whom, in which role, until when. */
export function InvitationCard({ invitation: inv }: { invitation: InvitationPreview }) {
  return (
    <dl className="grid grid-cols-[max-content_1fr] gap-x-6 gap-y-2 text-sm">
      <dt className="text-ink-soft">Team</dt>
      <dd className="font-medium">{inv.teamName}</dd>
      <dt className="text-ink-soft">Invited by</dt>
      <dd>{inv.invitedBy}</dd>
      <dt className="text-ink-soft">Role</dt>
      <dd>{roleLabel(inv.role)}</dd>
      <dt className="text-ink-soft">For</dt>
      <dd className="font-mono text-xs leading-5">{inv.email}</dd>
      <dt className="text-ink-soft">Valid until</dt>
      <dd>
        <time dateTime={inv.expiresAt}>{formatDateTime(inv.expiresAt)}</time>
      </dd>
    </dl>
  );
}
