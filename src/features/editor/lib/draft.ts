import type { EditorDoc } from "@/features/editor/commands/types";

/** An unsaved document kept in the browser so a reload or crash loses nothing. */
export interface Draft {
  diagramId: string;
  baseVersion: number;
  savedAt: string;
  doc: EditorDoc;
}

type Store = Pick<Storage, "getItem" | "setItem" | "removeItem" | "key" | "length">;

const PREFIX = "loopwright:draft:";
export const draftKey = (diagramId: string, baseVersion: number) => `${PREFIX}${diagramId}:v${baseVersion}`;

/** Keeps the draft; a full storage is reported as false rather than thrown (the editor still works). */
export function writeDraft(store: Store, draft: Draft): boolean {
  try {
    store.setItem(draftKey(draft.diagramId, draft.baseVersion), JSON.stringify(draft));
    return true;
  } catch {
    return false;
  }
}

/** Every readable draft of one diagram, newest base version first; unreadable entries are dropped. */
export function readDrafts(store: Store, diagramId: string): Draft[] {
  const found: Draft[] = [];
  for (const key of draftKeys(store, diagramId)) {
    try {
      const d = JSON.parse(store.getItem(key) ?? "") as Draft;
      if (d.diagramId === diagramId && Array.isArray(d.doc?.blocks) && Array.isArray(d.doc?.wires)) found.push(d);
      else store.removeItem(key);
    } catch {
      store.removeItem(key);
    }
  }
  return found.sort((a, b) => b.baseVersion - a.baseVersion || b.savedAt.localeCompare(a.savedAt));
}

/** Forgets every draft of one diagram (after a save, a reload or a discard). */
export function clearDrafts(store: Store, diagramId: string): void {
  for (const key of draftKeys(store, diagramId)) store.removeItem(key);
}

function draftKeys(store: Store, diagramId: string): string[] {
  const keys: string[] = [];
  for (let i = 0; i < store.length; i += 1) {
    const key = store.key(i);
    if (key?.startsWith(`${PREFIX}${diagramId}:`)) keys.push(key);
  }
  return keys;
}
