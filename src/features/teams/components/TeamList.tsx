import { Link } from "react-router-dom";
import { useTeams } from "@/features/teams/api/getTeams";
import { Empty, LoadError, Loading } from "@/components/QueryState";
import { href } from "@shared/routes";
import { roleLabel } from "@/lib/format";

export function TeamList() {
  const teams = useTeams();
  if (teams.isPending) return <Loading label="Loading your teams…" />;
  if (teams.isError) return <LoadError what="your teams" error={teams.error} onRetry={() => teams.refetch()} />;
  if (teams.data.length === 0)
    return <Empty>You are not in any team yet. Create one, or open an invitation link a colleague sent you.</Empty>;
  return (
    <table className="w-full text-left text-sm">
      <caption className="sr-only">Your teams</caption>
      <thead className="border-b border-rule text-xs text-ink-soft">
        <tr>
          <th scope="col" className="py-2 pr-4 font-medium">Team</th>
          <th scope="col" className="py-2 pr-4 font-medium">Your role</th>
          <th scope="col" className="py-2 text-right font-medium">Members</th>
        </tr>
      </thead>
      <tbody>
        {teams.data.map((t) => (
          <tr key={t.id} className="border-b border-rule/70 last:border-0">
            <th scope="row" className="py-2.5 pr-4 font-medium">
              <Link to={href.team(t.id)} className="text-signal underline-offset-2 hover:underline">
                {t.name}
              </Link>
            </th>
            <td className="py-2.5 pr-4">{roleLabel(t.role)}</td>
            <td className="py-2.5 text-right font-mono tabular-nums">{t.memberCount}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
