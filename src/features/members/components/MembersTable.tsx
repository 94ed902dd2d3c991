import { toast } from "sonner";
import type { MemberView } from "@shared/api/teams";
import { ConfirmButton } from "@/components/ConfirmButton";
import { errorMessage } from "@/lib/apiClient";
import { formatDate, roleLabel } from "@/lib/format";
import { useRemoveMember } from "@/features/members/api/removeMember";
import { RoleForm } from "@/features/members/components/RoleForm";

interface Props {
  teamId: string;
  teamName: string;
  members: MemberView[];
  /** Owners see role changes and removal; everyone may leave. */
  manage: boolean;
  currentUserId: string;
  onLeft: () => void;
}

const head = "py-2 pr-4 font-medium";

export function MembersTable({ teamId, teamName, members, manage, currentUserId, onLeft }: Props) {
  const remove = useRemoveMember(teamId);

  const removeOne = (m: MemberView) => {
    const leaving = m.userId === currentUserId;
    remove.mutateAsync({ userId: m.userId, leaving }).then(
      () => {
        toast.success(leaving ? `You left ${teamName}.` : `${m.name} was removed from ${teamName}.`);
        if (leaving) onLeft();
      },
      (e) => toast.error(errorMessage(e)),
    );
  };

  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Members of {teamName}</caption>
        <thead className="border-b border-rule text-xs text-ink-soft">
          <tr>
            <th scope="col" className={head}>Name</th>
            <th scope="col" className={head}>E-mail</th>
            <th scope="col" className={head}>Role</th>
            <th scope="col" className={head}>Joined</th>
            <th scope="col" className={`${head} text-right`}>Actions</th>
          </tr>
        </thead>
        <tbody>
          {members.map((m) => {
            const self = m.userId === currentUserId;
            return (
              <tr key={m.userId} className="border-b border-rule/70 last:border-0">
                <th scope="row" className="py-2.5 pr-4 font-medium">
                  {m.name}
                  {self && <span className="ml-2 text-xs font-normal text-ink-soft">(you)</span>}
                </th>
                <td className="py-2.5 pr-4 font-mono text-xs">{m.email}</td>
                <td className="py-2.5 pr-4">{manage ? <RoleForm teamId={teamId} member={m} /> : roleLabel(m.role)}</td>
                <td className="py-2.5 pr-4 whitespace-nowrap">
                  <time dateTime={m.joinedAt}>{formatDate(m.joinedAt)}</time>
                </td>
                <td className="py-2.5 text-right">
                  {(manage || self) && (
                    <ConfirmButton
                      label={self ? "Leave team" : "Remove"}
                      accessibleLabel={self ? `Leave ${teamName}` : `Remove ${m.name}`}
                      question={self ? `Leave ${teamName}?` : `Remove ${m.name}?`}
                      confirmLabel={self ? "Leave" : "Remove"}
                      pending={remove.isPending && remove.variables?.userId === m.userId}
                      onConfirm={() => removeOne(m)}
                    />
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
