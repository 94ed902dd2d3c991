import { useState } from "react";
import { Link } from "react-router-dom";
import { toast } from "sonner";
import type { DiagramSummary } from "@shared/api/diagrams";
import { Button } from "@/components/Button";
import { useArchiveDiagram } from "@/features/diagrams/api/archiveDiagram";
import { useRestoreDiagram } from "@/features/diagrams/api/restoreDiagram";
import { RenameDiagramForm } from "@/features/diagrams/components/RenameDiagramForm";
import { formatDateTime } from "@/lib/format";
import { errorMessage } from "@/lib/apiClient";
import { href } from "@shared/routes";

export function DiagramRow({ diagram: d, editable }: { diagram: DiagramSummary; editable: boolean }) {
  const [renaming, setRenaming] = useState(false);
  const archive = useArchiveDiagram();
  const restore = useRestoreDiagram();

  // Promise callbacks (not mutate's) so the Undo toast still reports after the archived row has left the table.
  const doRestore = () =>
    restore.mutateAsync(d.id).then(
      () => toast.success(`“${d.title}” restored.`),
      (e) => toast.error(`Could not restore “${d.title}”: ${errorMessage(e)}`),
    );
  const doArchive = () =>
    archive.mutateAsync(d.id).then(
      () => toast.success(`“${d.title}” archived.`, { action: { label: "Undo", onClick: () => void doRestore() } }),
      (e) => toast.error(`Could not archive “${d.title}”: ${errorMessage(e)}`),
    );

  return (
    <tr className="border-b border-rule/70 align-top last:border-0">
      <th scope="row" className="py-2.5 pr-4 font-medium">
        {renaming ? (
          <RenameDiagramForm diagram={d} onDone={() => setRenaming(false)} />
        ) : (
          <Link to={href.diagram(d.id)} className="text-signal underline-offset-2 hover:underline">
            {d.title}
          </Link>
        )}
        {!renaming && d.description && <p className="mt-0.5 text-xs font-normal text-ink-soft">{d.description}</p>}
      </th>
      <td className="py-2.5 pr-4 font-mono tabular-nums">
        {d.latestVersion === null ? <span className="text-ink-faint">none yet</span> : `v${d.latestVersion}`}
      </td>
      <td className="py-2.5 pr-4 whitespace-nowrap">
        <time dateTime={d.updatedAt}>{formatDateTime(d.updatedAt)}</time>
      </td>
      <td className="py-2.5 pr-4">{d.author}</td>
      {editable && (
        <td className="py-2.5 text-right whitespace-nowrap">
          <div className="inline-flex gap-2">
            {d.archivedAt === null ? (
              <>
                {!renaming && (
                  <Button size="sm" aria-label={`Rename ${d.title}`} onClick={() => setRenaming(true)}>
                    Rename
                  </Button>
                )}
                <Button size="sm" aria-label={`Archive ${d.title}`} pending={archive.isPending} onClick={doArchive}>
                  Archive
                </Button>
              </>
            ) : (
              <Button size="sm" aria-label={`Restore ${d.title}`} pending={restore.isPending} onClick={doRestore}>
                Restore
              </Button>
            )}
          </div>
        </td>
      )}
    </tr>
  );
}
