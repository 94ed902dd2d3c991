import { Link } from "react-router-dom";
import { toast } from "sonner";
import { shareLinkState, type ShareLinkView } from "@shared/api/shareLinks";
import { ConfirmButton } from "@/components/ConfirmButton";
import { Empty } from "@/components/QueryState";
import { errorMessage } from "@/lib/apiClient";
import { formatDateTime } from "@/lib/format";
import { useRevokeShareLink } from "@/features/shareLinks/api/revokeShareLink";
import { href } from "@shared/routes";

type Row = ShareLinkView & { diagram?: { id: string; title: string } };

interface Props {
  links: Row[];
  /** The diagram of every row, when the table lists one diagram's links; else each row names its own. */
  diagramId?: string;
  caption: string;
}

const head = "py-2 pr-4 font-medium";
const cell = "py-2.5 pr-4 whitespace-nowrap";
const STATE_LABEL = { active: "Active", revoked: "Revoked", expired: "Expired" } as const;

const when = (iso: string | null, none: string) =>
  iso ? <time dateTime={iso}>{formatDateTime(iso)}</time> : <span className="text-ink-faint">{none}</span>;

/** Share links with who made them, what they open and how they were used; active ones can be revoked. */
export function ShareLinksTable({ links, diagramId, caption }: Props) {
  const revoke = useRevokeShareLink();
  if (links.length === 0) return <Empty>No share links yet.</Empty>;
  const now = Date.now();
  const target = (l: Row) => (l.version === null ? "Latest version" : `v${l.version}`);
  const revokeOne = (l: Row) =>
    revoke.mutateAsync({ diagramId: l.diagram?.id ?? diagramId!, linkId: l.id }).then(
      () => toast.success("Share link revoked: it no longer opens."),
      (e) => toast.error(`Could not revoke the link: ${errorMessage(e)}`),
    );
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b border-rule text-xs text-ink-soft">
          <tr>
            {!diagramId && <th scope="col" className={head}>Diagram</th>}
            <th scope="col" className={head}>Opens</th>
            <th scope="col" className={head}>Created by</th>
            <th scope="col" className={head}>Created</th>
            <th scope="col" className={head}>Expires</th>
            <th scope="col" className={head}>Last opened</th>
            <th scope="col" className={head}>Times opened</th>
            <th scope="col" className={`${head} text-right`}>Status</th>
          </tr>
        </thead>
        <tbody>
          {links.map((l) => {
            const state = shareLinkState(l, now);
            const name = `${l.diagram ? `${l.diagram.title}, ` : ""}${target(l).toLowerCase()}, created ${formatDateTime(l.createdAt)}`;
            return (
              <tr key={l.id} className={`border-b border-rule/70 last:border-0 ${state === "active" ? "" : "text-ink-soft"}`}>
                {l.diagram && (
                  <th scope="row" className="py-2.5 pr-4 font-medium">
                    <Link to={href.diagram(l.diagram.id)} className="text-signal underline-offset-2 hover:underline">{l.diagram.title}</Link>
                  </th>
                )}
                <td className={`${cell} font-mono text-xs`}>{target(l)}</td>
                <td className="py-2.5 pr-4" title={l.creator?.email}>{l.creator?.name ?? "a former member"}</td>
                <td className={cell}>{when(l.createdAt, "")}</td>
                <td className={cell}>{when(l.expiresAt, "never")}</td>
                <td className={cell}>{when(l.lastOpenedAt, "not yet")}</td>
                <td className={`${cell} tabular-nums`}>{l.timesOpened}</td>
                <td className="py-2.5 text-right whitespace-nowrap">
                  {state === "active" ? (
                    <ConfirmButton
                      label="Revoke"
                      accessibleLabel={`Revoke link to ${name}`}
                      question="Stop this link from opening?"
                      confirmLabel="Revoke link"
                      pending={revoke.isPending && revoke.variables?.linkId === l.id}
                      onConfirm={() => void revokeOne(l)}
                    />
                  ) : (
                    <span className="text-xs">
                      {STATE_LABEL[state]} {state === "revoked" ? when(l.revokedAt, "") : null}
                    </span>
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
