import { Keyboard, LayoutGrid, Maximize, Redo2, Save, Share2, Undo2 } from "lucide-react";
import type { ReactNode } from "react";
import { Button } from "@/components/Button";
import type { VersionExports } from "@/features/editor/api/versionExport";
import { ExportMenu } from "@/features/editor/components/ExportMenu";

interface Props {
  readOnly: boolean;
  undoLabel?: string;
  redoLabel?: string;
  onUndo: () => void;
  onRedo: () => void;
  onLayout: () => void;
  layingOut: boolean;
  onFit: () => void;
  onHelp: () => void;
  onSave: () => void;
  /** The open saved version's downloads for the Export menu; null before the first save (disabled), none: no menu. */
  download?: VersionExports | null;
  /** Opens the share dialog; none: no Share action (viewers, view-only sessions). */
  onShare?: () => void;
  status: ReactNode;
}

const tool = "inline-flex items-center gap-1.5 rounded px-2 py-1.5 text-sm text-ink hover:bg-paper-sunk disabled:cursor-not-allowed disabled:opacity-40";

/** The commands above the canvas; every one also has a key (see the shortcuts dialog). */
export function EditorToolbar({ readOnly, undoLabel, redoLabel, onUndo, onRedo, onLayout, layingOut, onFit, onHelp, onSave, download, onShare, status }: Props) {
  return (
    <div role="toolbar" aria-label="Editor" className="flex flex-wrap items-center gap-1 rounded-t-md border border-b-0 border-rule bg-paper-raised px-2 py-1.5">
      {!readOnly && (
        <>
          <button type="button" className={tool} onClick={onUndo} disabled={!undoLabel} aria-keyshortcuts="Control+Z" title={undoLabel ? `Undo: ${undoLabel}` : "Nothing to undo"}>
            <Undo2 className="size-4" aria-hidden /> Undo
          </button>
          <button type="button" className={tool} onClick={onRedo} disabled={!redoLabel} aria-keyshortcuts="Control+Shift+Z" title={redoLabel ? `Redo: ${redoLabel}` : "Nothing to redo"}>
            <Redo2 className="size-4" aria-hidden /> Redo
          </button>
          <span aria-hidden className="mx-1 h-5 w-px bg-rule" />
          <button type="button" className={tool} onClick={onLayout} disabled={layingOut} aria-keyshortcuts="L">
            <LayoutGrid className="size-4" aria-hidden /> {layingOut ? "Laying out…" : "Auto layout"}
          </button>
        </>
      )}
      <button type="button" className={tool} onClick={onFit} aria-keyshortcuts="F">
        <Maximize className="size-4" aria-hidden /> Fit view
      </button>
      <button type="button" className={tool} onClick={onHelp} aria-keyshortcuts="Shift+?">
        <Keyboard className="size-4" aria-hidden /> Shortcuts
      </button>
      {download !== undefined && <ExportMenu exports={download} className={tool} />}
      {onShare && !readOnly && (
        <button type="button" className={tool} onClick={onShare} title="Make a read-only link that opens without an account">
          <Share2 className="size-4" aria-hidden /> Share
        </button>
      )}
      <div className="ml-auto flex items-center gap-3">
        <span className="text-xs text-ink-soft" role="status">{status}</span>
        {!readOnly && (
          <Button variant="primary" size="sm" onClick={onSave} aria-keyshortcuts="Control+S">
            <Save className="size-4" aria-hidden /> Save version
          </Button>
        )}
      </div>
    </div>
  );
}
