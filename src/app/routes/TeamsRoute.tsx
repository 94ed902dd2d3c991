import { useNavigate } from "react-router-dom";
import { CreateTeamForm } from "@/features/teams/components/CreateTeamForm";
import { TeamList } from "@/features/teams/components/TeamList";
import { PageTitle } from "@/components/PageTitle";
import { Panel } from "@/components/Panel";
import { href } from "@shared/routes";

export function TeamsRoute() {
  const navigate = useNavigate();
  return (
    <>
      <PageTitle title="Teams" />
      <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
        <Panel title="Your teams">
          <TeamList />
        </Panel>
        <Panel title="Create a team">
          <CreateTeamForm onCreated={(team) => navigate(href.team(team.id))} />
        </Panel>
      </div>
    </>
  );
}
