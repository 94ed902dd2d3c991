import { Link, useParams } from "react-router-dom";
import { canManageMembers } from "@shared/api/teams";
import { useTeam } from "@/features/teams/api/getTeam";
import { useMembers } from "@/features/members/api/getMembers";
import { useDiagrams } from "@/features/diagrams/api/getDiagrams";
import { TeamActivity } from "@/features/audit/components/TeamActivity";
import { PageTitle } from "@/components/PageTitle";
import { Panel } from "@/components/Panel";
import { LoadError, Loading } from "@/components/QueryState";
import { href } from "@shared/routes";

/** The team's audit trail, for owners; the filters' choices come from the team's members and diagrams. */
export function ActivityRoute() {
  const teamId = useParams().teamId!;
  const team = useTeam(teamId);
  const members = useMembers(teamId);
  const active = useDiagrams(teamId, false);
  const archived = useDiagrams(teamId, true);
  if (team.isPending) return <Loading label="Loading the team…" />;
  if (team.isError) return <LoadError what="this team" error={team.error} onRetry={() => team.refetch()} />;
  const title = `Activity in ${team.data.name}`;
  if (!canManageMembers(team.data.role))
    return (
      <>
        <PageTitle title={title} kicker="Team" />
        <p className="rounded border border-rule bg-paper-raised px-4 py-3 text-sm text-ink-soft">
          Only the team&apos;s owners can read its activity. <Link to={href.team(teamId)} className="text-signal underline">Back to the team</Link>
        </p>
      </>
    );
  const people = (members.data?.members ?? []).map((m) => ({ id: m.userId, name: m.name }));
  const diagrams = [
    ...(active.data ?? []).map((d) => ({ id: d.id, title: d.title, archived: false })),
    ...(archived.data ?? []).map((d) => ({ id: d.id, title: d.title, archived: true })),
  ];
  return (
    <>
      <PageTitle title={title} kicker="Team · owners only" />
      <Panel title="Who did what">
        <TeamActivity teamId={teamId} people={people} diagrams={diagrams} />
      </Panel>
    </>
  );
}
