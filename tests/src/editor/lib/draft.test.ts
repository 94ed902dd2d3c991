import { describe, expect, it } from "vitest";
import { clearDrafts, draftKey, readDrafts, writeDraft } from "@/features/editor/lib/draft";
import { unityLoop } from "../support";

/** An in-memory Storage with the same key()/length walk as the browser's. */
function memoryStorage(limit = Infinity) {
  const data = new Map<string, string>();
  return {
    get length() {
      return data.size;
    },
    key: (i: number) => [...data.keys()][i] ?? null,
    getItem: (k: string) => data.get(k) ?? null,
    setItem: (k: string, v: string) => {
      if (v.length > limit) throw new DOMException("quota", "QuotaExceededError");
      data.set(k, v);
    },
    removeItem: (k: string) => void data.delete(k),
    data,
  };
}

describe("local drafts", () => {
  it("are kept per diagram and base version, newest base first, and cleared per diagram", () => {
    const store = memoryStorage();
    const doc = unityLoop();
    writeDraft(store, { diagramId: "d1", baseVersion: 2, savedAt: "2030-01-01T00:00:00Z", doc });
    writeDraft(store, { diagramId: "d1", baseVersion: 3, savedAt: "2030-01-02T00:00:00Z", doc });
    writeDraft(store, { diagramId: "d2", baseVersion: 1, savedAt: "2030-01-03T00:00:00Z", doc });
    expect(readDrafts(store, "d1").map((d) => d.baseVersion)).toEqual([3, 2]);
    expect(readDrafts(store, "d1")[0].doc).toEqual(doc);
    clearDrafts(store, "d1");
    expect(readDrafts(store, "d1")).toEqual([]);
    expect(readDrafts(store, "d2")).toHaveLength(1);
  });

  it("drop unreadable entries and report a full storage instead of throwing", () => {
    const store = memoryStorage(50);
    store.data.set(draftKey("d1", 1), "{not json");
    store.data.set(draftKey("d1", 2), JSON.stringify({ diagramId: "d1", doc: { blocks: "no" } }));
    expect(readDrafts(store, "d1")).toEqual([]);
    expect(store.length).toBe(0);
    expect(writeDraft(store, { diagramId: "d1", baseVersion: 1, savedAt: "x", doc: unityLoop() })).toBe(false);
  });
});
