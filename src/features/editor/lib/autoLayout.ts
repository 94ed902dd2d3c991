import type { ELK as ElkApi } from "elkjs/lib/elk-api";
import type { EditorDoc, Point } from "@/features/editor/commands/types";
import { elkGraph, elkPositions } from "@/features/editor/lib/elkGraph";

let elk: Promise<ElkApi> | null = null;

/** ELK and its worker load on first use only: they weigh more than the rest of the editor. */
function loadElk(): Promise<ElkApi> {
  elk ??= Promise.all([import("elkjs/lib/elk-api.js"), import("elkjs/lib/elk-worker.min.js?url")]).then(
    ([api, worker]) => new api.default({ workerUrl: worker.default }),
  );
  return elk;
}

/** New top-left positions for every block, laid out left to right with feedback paths underneath. */
export async function autoLayout(doc: EditorDoc, sizes: ReadonlyMap<string, { width: number; height: number }>): Promise<Record<string, Point>> {
  const elk = await loadElk();
  return elkPositions(await elk.layout(elkGraph(doc, sizes)));
}
