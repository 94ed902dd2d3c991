import { useState } from "react";
import type { DiagramDetail } from "@shared/api/diagrams";
import { Button } from "@/components/Button";
import type { Draft } from "@/features/editor/lib/draft";
import { formatDateTime } from "@/lib/format";

/** What the notice needs of the newest saved version. */
export interface SavedVersion {
  number: number;
  createdBy: string;
}

interface Props {
  diagram: DiagramDetail["diagram"];
  readOnly: boolean;
  base: number;
  latestNow: SavedVersion | null;
  /** The session has changes not saved yet: opening the newer version would drop them. */
  dirty: boolean;
  /** This browser holds the unsaved changes as a draft: opening the newer version then loses nothing (it offers them back). */
  draftKept: boolean;
  draft: Draft | null;
  onRestore: () => void;
  onDiscardDraft: () => void;
  onReload: () => void;
  /** Shows the newer version beside the open document (with its unsaved changes), without leaving the editor. */
  onCompare: (newer: number) => void;
}

const note = "mb-3 flex flex-wrap items-center gap-x-4 gap-y-2 rounded border px-3 py-2 text-sm";

/** Notes above the editor: archived, read only, a draft to restore, a newer version saved by someone else. */
export function SessionBanners({ diagram, readOnly, base, latestNow, dirty, draftKept, draft, onRestore, onDiscardDraft, onReload, onCompare }: Props) {
  // "Keep editing" hides the notice for that version; a later one shows it again.
  const [kept, setKept] = useState(0);
  return (
    <>
      {diagram.archivedAt && (
        <p className={`${note} border-trace/50 bg-trace-tint`}>This diagram was archived on {formatDateTime(diagram.archivedAt)}.</p>
      )}
      {readOnly && (
        <p className={`${note} border-rule bg-paper-raised`}>
          You are a viewer in {diagram.teamName}: you can explore the diagram and its result, but not change it.
        </p>
      )}
      {draft && !readOnly && (
        <div role="region" aria-label="Unsaved draft" className={`${note} border-signal/40 bg-signal-tint`}>
          <p className="flex-1">
            This browser kept unsaved changes from {formatDateTime(draft.savedAt)}, made on top of{" "}
            {draft.baseVersion ? `v${draft.baseVersion}` : "the empty diagram"}.
            {draft.baseVersion !== base && " A newer version exists now; saving them will ask how to resolve that."}
          </p>
          <Button size="sm" variant="primary" onClick={onRestore}>Restore draft</Button>
          <Button size="sm" variant="quiet" onClick={onDiscardDraft}>Discard draft</Button>
        </div>
      )}
      {latestNow && latestNow.number > base && latestNow.number > kept && !draft && (
        <div role="status" className={`${note} border-trace/50 bg-trace-tint`}>
          <p className="flex-1">
            {latestNow.createdBy || "Someone"} saved v{latestNow.number} after the v{base || 0} you are editing.
            {readOnly ? "" : " Saving will ask whether to load it or keep yours as a new diagram."}
          </p>
          {(readOnly || !dirty) && <Button size="sm" onClick={onReload}>Open v{latestNow.number}</Button>}
          {!readOnly && dirty && draftKept && (
            <Button size="sm" onClick={onReload}>Open v{latestNow.number}, keep my changes as a draft</Button>
          )}
          <Button size="sm" onClick={() => onCompare(latestNow.number)}>{dirty ? "Compare with my changes" : `Compare with v${base || 0}`}</Button>
          <Button size="sm" variant="quiet" onClick={() => setKept(latestNow.number)}>Keep editing</Button>
        </div>
      )}
    </>
  );
}
