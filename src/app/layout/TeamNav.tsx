import { NavLink, useParams } from "react-router-dom";
import { useEditorDiagram } from "@/features/editor/api/getEditorDiagram";
import { useTeam } from "@/features/teams/api/getTeam";
import { canManageMembers } from "@shared/api/teams";
import { href } from "@shared/routes";

const link = "rounded px-2 py-1 text-ink-soft hover:bg-paper-sunk hover:text-ink aria-[current=page]:bg-signal-tint aria-[current=page]:font-medium aria-[current=page]:text-signal-strong";

/** The current team's name and its pages; the team comes from the URL, or from the open diagram. */
export function TeamNav() {
  const params = useParams();
  const diagram = useEditorDiagram(params.teamId ? undefined : params.id);
  const teamId = params.teamId ?? diagram.data?.diagram.teamId;
  if (!teamId) return null;
  return <CurrentTeam teamId={teamId} />;
}

function CurrentTeam({ teamId }: { teamId: string }) {
  const team = useTeam(teamId);
  if (!team.data) return null;
  return (
    <div className="flex items-center gap-2">
      <span aria-hidden className="text-rule-strong">/</span>
      <span className="font-medium text-ink">{team.data.name}</span>
      <NavLink to={href.team(teamId)} end className={link}>
        Diagrams
      </NavLink>
      <NavLink to={href.members(teamId)} className={link}>
        Members
      </NavLink>
      {canManageMembers(team.data.role) && (
        <NavLink to={href.activity(teamId)} className={link}>
          Activity
        </NavLink>
      )}
    </div>
  );
}
