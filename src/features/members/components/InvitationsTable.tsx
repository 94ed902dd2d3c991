import { toast } from "sonner";
import type { InvitationView } from "@shared/api/teams";
import { Button } from "@/components/Button";
import { Empty } from "@/components/QueryState";
import { errorMessage } from "@/lib/apiClient";
import { formatDateTime, roleLabel } from "@/lib/format";
import { useRevokeInvitation } from "@/features/members/api/revokeInvitation";

const head = "py-2 pr-4 font-medium";

/** Open invitations of a team; only owners receive any, so only they see this table. */
export function InvitationsTable({ teamId, invitations }: { teamId: string; invitations: InvitationView[] }) {
  const revoke = useRevokeInvitation(teamId);
  if (invitations.length === 0) return <Empty>No open invitations.</Empty>;

  const revokeOne = (inv: InvitationView) =>
    revoke.mutateAsync(inv.id).then(
      () => toast.success(`Invitation for ${inv.email} revoked.`),
      (e) => toast.error(errorMessage(e)),
    );

  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Open invitations</caption>
        <thead className="border-b border-rule text-xs text-ink-soft">
          <tr>
            <th scope="col" className={head}>E-mail</th>
            <th scope="col" className={head}>Role</th>
            <th scope="col" className={head}>Invited by</th>
            <th scope="col" className={head}>Expires</th>
            <th scope="col" className={`${head} text-right`}>Actions</th>
          </tr>
        </thead>
        <tbody>
          {invitations.map((inv) => (
            <tr key={inv.id} className="border-b border-rule/70 last:border-0">
              <th scope="row" className="py-2.5 pr-4 font-mono text-xs font-normal">{inv.email}</th>
              <td className="py-2.5 pr-4">{roleLabel(inv.role)}</td>
              <td className="py-2.5 pr-4">{inv.invitedBy}</td>
              <td className="py-2.5 pr-4 whitespace-nowrap">
                <time dateTime={inv.expiresAt}>{formatDateTime(inv.expiresAt)}</time>
              </td>
              <td className="py-2.5 text-right">
                <Button
                  size="sm"
                  variant="danger"
                  aria-label={`Revoke invitation for ${inv.email}`}
                  pending={revoke.isPending && revoke.variables === inv.id}
                  onClick={() => void revokeOne(inv)}
                >
                  Revoke
                </Button>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
