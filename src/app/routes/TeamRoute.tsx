import { Link, useParams } from "react-router-dom";
import { canEdit, canManageMembers } from "@shared/api/teams";
import { useTeam } from "@/features/teams/api/getTeam";
import { CreateDiagramForm } from "@/features/diagrams/components/CreateDiagramForm";
import { DiagramTable } from "@/features/diagrams/components/DiagramTable";
import { ImportDiagramArea } from "@/features/diagrams/components/ImportDiagramArea";
import { TeamShareLinks } from "@/features/shareLinks/components/TeamShareLinks";
import { buttonClass } from "@/components/Button";
import { PageTitle } from "@/components/PageTitle";
import { Panel } from "@/components/Panel";
import { LoadError, Loading } from "@/components/QueryState";
import { roleLabel } from "@/lib/format";
import { href } from "@shared/routes";

/** A team's diagrams; creating and changing them is offered only to owners and editors. */
export function TeamRoute() {
  const teamId = useParams().teamId!;
  const team = useTeam(teamId);
  if (team.isPending) return <Loading label="Loading the team…" />;
  if (team.isError) return <LoadError what="this team" error={team.error} onRetry={() => team.refetch()} />;
  const editable = canEdit(team.data.role);
  return (
    <>
      <PageTitle title={team.data.name} kicker={`Team · you are ${roleLabel(team.data.role).toLowerCase()}`}>
        <Link to={href.members(teamId)} className={buttonClass("secondary")}>
          Members ({team.data.memberCount})
        </Link>
        {canManageMembers(team.data.role) && (
          <Link to={href.activity(teamId)} className={buttonClass("secondary")}>
            Activity
          </Link>
        )}
      </PageTitle>
      <div className="flex flex-col gap-6">
        {editable ? (
          <Panel title="New diagram">
            <CreateDiagramForm teamId={teamId} />
          </Panel>
        ) : (
          <p className="rounded border border-rule bg-paper-raised px-4 py-3 text-sm text-ink-soft">
            You can read this team&apos;s diagrams. Ask an owner for the editor role to create or change them.
          </p>
        )}
        <Panel title="Diagrams">
          {editable ? (
            <ImportDiagramArea teamId={teamId}>
              <DiagramTable teamId={teamId} editable />
            </ImportDiagramArea>
          ) : (
            <DiagramTable teamId={teamId} editable={false} />
          )}
        </Panel>
        {editable && (
          <Panel title="Share links">
            <TeamShareLinks teamId={teamId} />
          </Panel>
        )}
      </div>
    </>
  );
}
