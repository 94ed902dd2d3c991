import { useEffect, useState } from "react";
import type { EditorDoc } from "@/features/editor/commands/types";
import { clearDrafts, readDrafts, writeDraft, type Draft } from "@/features/editor/lib/draft";

/** A draft from an earlier visit that differs from what was just loaded; the loaded document is serialised only if a draft exists. */
function leftOver(diagramId: string, loaded: EditorDoc): Draft | null {
  const drafts = readDrafts(localStorage, diagramId);
  if (drafts.length === 0) return null;
  const text = JSON.stringify(loaded);
  return drafts.find((d) => JSON.stringify(d.doc) !== text) ?? null;
}

/**
 * Keeps unsaved work in localStorage under the diagram id and the version it started from, and offers a
 * draft left by an earlier visit (one that differs from what was just loaded) for restoring.
 */
export function useDraft(diagramId: string, baseVersion: number, doc: EditorDoc, dirty: boolean, loaded: EditorDoc) {
  const [offer, setOffer] = useState<Draft | null>(() => leftOver(diagramId, loaded));
  const [failed, setFailed] = useState(false);

  useEffect(() => {
    if (!dirty) return;
    const ok = writeDraft(localStorage, { diagramId, baseVersion, savedAt: new Date().toISOString(), doc });
    setFailed(!ok);
  }, [diagramId, baseVersion, doc, dirty]);

  return {
    /** A draft from an earlier visit, until the user restores or discards it. */
    offer,
    /** True when the browser refused to store the draft (storage full or disabled). */
    failed,
    closeOffer: () => setOffer(null),
    /** Forgets every stored draft of this diagram (after a save, a reload or a discard). */
    clear: () => clearDrafts(localStorage, diagramId),
  };
}
