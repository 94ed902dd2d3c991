import { useState } from "react";
import { Link, useNavigate } from "react-router-dom";
import { toast } from "sonner";
import type { VersionListItem } from "@shared/api/versions";
import { Button } from "@/components/Button";
import { Empty } from "@/components/QueryState";
import { useRestoreVersion } from "@/features/versions/api/restoreVersion";
import { summaryText } from "@/features/versions/lib/summaryText";
import { errorMessage } from "@/lib/apiClient";
import { formatDateTime } from "@/lib/format";
import { href } from "@shared/routes";

const head = "py-2 pr-4 font-medium";
const cell = "py-2 pr-4 align-top";

interface Props {
  diagramId: string;
  versions: VersionListItem[];
  /** Editors and owners may restore a version as a new one. */
  editable: boolean;
}

/** Every version of a diagram, newest first: open one read-only, restore it, or pick two to compare. */
export function VersionTable({ diagramId, versions, editable }: Props) {
  const navigate = useNavigate();
  const restore = useRestoreVersion(diagramId);
  // Compare defaults to the two newest: what the last save changed.
  const [from, setFrom] = useState(versions[1]?.number ?? versions[0]?.number ?? 0);
  const [to, setTo] = useState(versions[0]?.number ?? 0);
  if (versions.length === 0) return <Empty>No version saved yet. Save one from the editor.</Empty>;
  const latest = versions[0].number;

  const onRestore = (n: number) =>
    restore.mutate(n, {
      onSuccess: (v) => {
        toast.success(`Restored v${n} as v${v.number}`);
        navigate(href.diagram(diagramId));
      },
      onError: (e) => toast.error(errorMessage(e)),
    });

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center gap-3 text-sm">
        <span className="text-ink-soft">Compare the versions chosen in the From and To columns:</span>
        <Button size="sm" variant="primary" disabled={from === to} onClick={() => navigate(href.compare(diagramId, from, to))}>
          Compare v{from} with v{to}
        </Button>
      </div>
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Versions</caption>
          <thead className="border-b border-rule text-xs text-ink-soft">
            <tr>
              <th scope="col" className={head}>Version</th>
              <th scope="col" className={head}>Message</th>
              <th scope="col" className={head}>Author</th>
              <th scope="col" className={head}>Saved</th>
              <th scope="col" className={head}>Checked result</th>
              <th scope="col" className={head}>From</th>
              <th scope="col" className={head}>To</th>
              {editable && <th scope="col" className={`${head} text-right`}>Actions</th>}
            </tr>
          </thead>
          <tbody>
            {versions.map((v) => {
              const summary = summaryText(v);
              return (
                <tr key={v.number} className="border-b border-rule last:border-b-0">
                  <td className={cell}>
                    <Link to={href.diagramVersion(diagramId, v.number)} className="font-medium text-signal underline underline-offset-2" aria-label={`Open v${v.number} read-only`}>
                      v{v.number}
                    </Link>
                    {v.number === latest && <span className="ml-2 text-xs text-ink-faint">latest</span>}
                    <Link to={href.sheet(diagramId, v.number)} className="ml-3 text-xs text-signal underline underline-offset-2" aria-label={`Review sheet of v${v.number}`}>
                      Sheet
                    </Link>
                  </td>
                  <td className={cell}>{v.message || <span className="text-ink-faint">No message</span>}</td>
                  <td className={cell}>{v.createdBy}</td>
                  <td className={`${cell} whitespace-nowrap`}>{formatDateTime(v.createdAt)}</td>
                  <td className={`${cell} ${summary.problem ? "font-medium text-fault" : ""}`}>{summary.text}</td>
                  <td className={cell}>
                    <input type="radio" name="compare-from" aria-label={`Compare from v${v.number}`} checked={from === v.number} onChange={() => setFrom(v.number)} className="accent-signal" />
                  </td>
                  <td className={cell}>
                    <input type="radio" name="compare-to" aria-label={`Compare to v${v.number}`} checked={to === v.number} onChange={() => setTo(v.number)} className="accent-signal" />
                  </td>
                  {editable && (
                    <td className={`${cell} text-right`}>
                      {v.number !== latest && (
                        // Nothing is lost either way: a restore adds a version and keeps every one before it.
                        <Button size="sm" pending={restore.isPending && restore.variables === v.number} onClick={() => onRestore(v.number)} title={`Save a copy of v${v.number} as v${latest + 1}`}>
                          Restore v{v.number}
                        </Button>
                      )}
                    </td>
                  )}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}
