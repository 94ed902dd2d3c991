import { useNavigate, useParams } from "react-router-dom";
import { canManageMembers } from "@shared/api/teams";
import { useUser } from "@/app/RequireAuth";
import { useTeam } from "@/features/teams/api/getTeam";
import { TeamPeople } from "@/features/members/components/TeamPeople";
import { PageTitle } from "@/components/PageTitle";
import { LoadError, Loading } from "@/components/QueryState";
import { href } from "@shared/routes";

export function MembersRoute() {
  const teamId = useParams().teamId!;
  const user = useUser();
  const team = useTeam(teamId);
  const navigate = useNavigate();
  if (team.isPending) return <Loading label="Loading the team…" />;
  if (team.isError) return <LoadError what="this team" error={team.error} onRetry={() => team.refetch()} />;
  return (
    <>
      <PageTitle title={`Members of ${team.data.name}`} kicker="Team" />
      <TeamPeople
        teamId={teamId}
        teamName={team.data.name}
        manage={canManageMembers(team.data.role)}
        currentUserId={user.id}
        onLeft={() => navigate(href.teams())}
      />
    </>
  );
}
