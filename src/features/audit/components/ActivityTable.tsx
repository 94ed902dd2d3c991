import { Link } from "react-router-dom";
import type { AuditEventView } from "@shared/api/audit";
import { formatDateTime } from "@/lib/format";
import { AUDIT_KIND_VIEWS, actorName } from "@/features/audit/components/auditKindViews";
import { href } from "@shared/routes";

const head = "py-2 pr-4 font-medium";

/** The diagram an event names: a link while it exists (a comment's goes to its thread), else the title it had. */
function diagramRef(e: AuditEventView) {
  const version = e.detail.version;
  if (!e.diagram) return <span>{typeof e.detail.title === "string" ? e.detail.title : "a deleted diagram"}</span>;
  const to =
    e.kind.startsWith("comment.") && typeof version === "number" && e.subject
      ? href.diagramComment(e.diagram.id, version, e.subject)
      : href.diagram(e.diagram.id);
  return (
    <Link to={to} className="text-signal underline-offset-2 hover:underline">
      {e.diagram.title}
    </Link>
  );
}

/** The team's activity, newest first: when, who, and what in plain words. */
export function ActivityTable({ events }: { events: AuditEventView[] }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Team activity, newest first</caption>
        <thead className="border-b border-rule text-xs text-ink-soft">
          <tr>
            <th scope="col" className={head}>When</th>
            <th scope="col" className={head}>Who</th>
            <th scope="col" className={head}>What</th>
          </tr>
        </thead>
        <tbody>
          {events.map((e) => (
            <tr key={e.id} className="border-b border-rule/70 last:border-0">
              <td className="py-2.5 pr-4 whitespace-nowrap text-ink-soft">
                <time dateTime={e.at}>{formatDateTime(e.at)}</time>
              </td>
              <td className="py-2.5 pr-4 font-medium">{actorName(e)}</td>
              <td className="py-2.5 pr-4">{AUDIT_KIND_VIEWS[e.kind].what(e, { diagram: diagramRef(e) })}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
