import { Panel } from "@/components/Panel";
import { LoadError, Loading } from "@/components/QueryState";
import { useMembers } from "@/features/members/api/getMembers";
import { InvitationsTable } from "@/features/members/components/InvitationsTable";
import { InviteForm } from "@/features/members/components/InviteForm";
import { MembersTable } from "@/features/members/components/MembersTable";

interface Props {
  teamId: string;
  teamName: string;
  manage: boolean;
  currentUserId: string;
  onLeft: () => void;
}

/** The members page body: invite form and open invitations for owners, the member table for all. */
export function TeamPeople({ teamId, teamName, manage, currentUserId, onLeft }: Props) {
  const people = useMembers(teamId);
  return (
    <div className="flex flex-col gap-6">
      {manage && (
        <Panel title="Invite a colleague">
          <InviteForm teamId={teamId} />
        </Panel>
      )}
      <Panel title="Members">
        {people.isPending ? (
          <Loading label="Loading members…" />
        ) : people.isError ? (
          <LoadError what="the members" error={people.error} onRetry={() => people.refetch()} />
        ) : (
          <MembersTable
            teamId={teamId}
            teamName={teamName}
            members={people.data.members}
            manage={manage}
            currentUserId={currentUserId}
            onLeft={onLeft}
          />
        )}
      </Panel>
      {manage && people.isSuccess && (
        <Panel title="Open invitations">
          <InvitationsTable teamId={teamId} invitations={people.data.invitations} />
        </Panel>
      )}
      {!manage && <p className="text-sm text-ink-soft">Only owners of {teamName} can invite people or change roles.</p>}
    </div>
  );
}
