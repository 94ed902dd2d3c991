import { useState } from "react";
import type { LatestVersionView } from "@shared/api/diagrams";
import { Button } from "@/components/Button";
import { FormError, TextField } from "@/components/Field";
import { Dialog } from "@/features/editor/components/dialogs/Dialog";
import { formatDateTime } from "@/lib/format";

interface Props {
  message: string;
  baseVersion: number;
  latest: LatestVersionView | null;
  defaultTitle: string;
  pending: boolean;
  error?: string;
  onReload: () => void;
  onSaveAsNew: (title: string) => void;
  onClose: () => void;
}

/**
 * Someone saved first. Nothing is overwritten: load their version (after a second confirmation, since local
 * changes are then dropped) or keep this work as a new diagram; closing keeps editing with the draft kept.
 */
export function ConflictDialog({ message, baseVersion, latest, defaultTitle, pending, error, onReload, onSaveAsNew, onClose }: Props) {
  const [mode, setMode] = useState<"choose" | "confirm-reload" | "save-as">("choose");
  const [title, setTitle] = useState(defaultTitle);
  return (
    <Dialog title="A newer version was saved" onClose={onClose}>
      <div className="flex flex-col gap-3 text-sm">
        <p role="alert">{message}</p>
        {latest && (
          <p className="rounded border border-rule bg-paper px-3 py-2">
            <span className="font-mono">v{latest.number}</span> by {latest.createdBy || "someone"}, {formatDateTime(latest.createdAt)}
            {latest.message && <>: “{latest.message}”</>}. You started from <span className="font-mono">v{baseVersion}</span>.
          </p>
        )}
        {mode === "choose" && (
          <div className="flex flex-col gap-2">
            <Button onClick={() => setMode("confirm-reload")}>Load the newer version…</Button>
            <Button onClick={() => setMode("save-as")}>Save mine as a new diagram…</Button>
            <Button variant="quiet" onClick={onClose}>Keep editing (nothing is saved yet)</Button>
          </div>
        )}
        {mode === "confirm-reload" && (
          <div role="group" aria-label="Confirm loading the newer version" className="flex flex-col gap-2">
            <p>Your unsaved changes on this diagram will be discarded. Load the newer version?</p>
            <div className="flex justify-end gap-2">
              <Button variant="quiet" onClick={() => setMode("choose")}>Back</Button>
              <Button variant="danger" pending={pending} onClick={onReload}>Discard my changes and load it</Button>
            </div>
          </div>
        )}
        {mode === "save-as" && (
          <form
            className="flex flex-col gap-2"
            onSubmit={(e) => {
              e.preventDefault();
              onSaveAsNew(title.trim());
            }}
          >
            <TextField label="Title of the new diagram" value={title} maxLength={120} onChange={(e) => setTitle(e.target.value)} autoFocus />
            <FormError message={error} />
            <div className="flex justify-end gap-2">
              <Button variant="quiet" onClick={() => setMode("choose")}>Back</Button>
              <Button type="submit" variant="primary" pending={pending} disabled={!title.trim()}>Create diagram and save</Button>
            </div>
          </form>
        )}
      </div>
    </Dialog>
  );
}
