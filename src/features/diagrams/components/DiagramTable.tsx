import { useId, useState } from "react";
import { useDiagrams } from "@/features/diagrams/api/getDiagrams";
import { DiagramRow } from "@/features/diagrams/components/DiagramRow";
import { Empty, LoadError, Loading } from "@/components/QueryState";

const head = "py-2 pr-4 font-medium";

/** A team's diagrams; `editable` (owner/editor) adds rename, archive and restore. */
export function DiagramTable({ teamId, editable }: { teamId: string; editable: boolean }) {
  const [archived, setArchived] = useState(false);
  const toggleId = useId();
  const list = useDiagrams(teamId, archived);
  const what = archived ? "archived diagrams" : "diagrams";

  return (
    <div className="flex flex-col gap-3">
      <div className="flex items-center gap-2 text-sm">
        <input
          id={toggleId}
          type="checkbox"
          checked={archived}
          onChange={(e) => setArchived(e.target.checked)}
          className="size-4 accent-signal"
        />
        <label htmlFor={toggleId}>Show archived diagrams</label>
      </div>
      {list.isPending ? (
        <Loading label={`Loading ${what}…`} />
      ) : list.isError ? (
        <LoadError what={what} error={list.error} onRetry={() => list.refetch()} />
      ) : list.data.length === 0 ? (
        <Empty>
          {archived
            ? "No archived diagrams."
            : editable
              ? "No diagrams yet. Create the first one above."
              : "No diagrams yet. Editors and owners of this team can create them."}
        </Empty>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">{archived ? "Archived diagrams" : "Diagrams"}</caption>
            <thead className="border-b border-rule text-xs text-ink-soft">
              <tr>
                <th scope="col" className={head}>Title</th>
                <th scope="col" className={head}>Latest version</th>
                <th scope="col" className={head}>Updated</th>
                <th scope="col" className={head}>Author</th>
                {editable && <th scope="col" className={`${head} text-right`}>Actions</th>}
              </tr>
            </thead>
            <tbody>
              {list.data.map((d) => (
                <DiagramRow key={d.id} diagram={d} editable={editable} />
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
