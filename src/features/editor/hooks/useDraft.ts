import { useEffect, useState } from "react";
import type { EditorDoc } from "@/features/editor/commands/types";
import { clearDrafts, readDrafts, writeDraft, type Draft } from "@/features/editor/lib/draft";

const same = (a: EditorDoc, b: EditorDoc) => JSON.stringify(a) === JSON.stringify(b);

/**
 * Keeps unsaved work in localStorage under the diagram id and the version it started from, and offers a
 * draft left by an earlier visit (one that differs from what was just loaded) for restoring.
 */
export function useDraft(diagramId: string, baseVersion: number, doc: EditorDoc, dirty: boolean, loaded: EditorDoc) {
  const [offer, setOffer] = useState<Draft | null>(() => readDrafts(localStorage, diagramId).find((d) => !same(d.doc, loaded)) ?? null);
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
