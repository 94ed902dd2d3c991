import type { DiagramDocument } from "@shared/diagram/schema";

/**
 * The blocks a pair's transfer depends on, by Mason's definitions (common practice): the forward paths from the
 * input to the output (no block twice) and the loops (elementary circuits) touching them, directly or through a
 * chain of touching loops — a loop outside that chain cancels between Δ and every Δ_k. Read straight from the
 * document's wires (no use of our parser or reducer); enumeration is exponential, so keep diagrams small.
 * Example: unity feedback r → e → g → y, g → e gives paths [[r, e, g, y]], loops [[e, g]], blocks {e, g}.
 */
export interface PairStructure {
  paths: string[][];
  loops: string[][];
  /** Blocks on the paths and touching loops, the pair's own input and output left out. */
  blocks: Set<string>;
}

const MAX_WALKS = 200_000;

function successors(doc: DiagramDocument): Map<string, string[]> {
  const next = new Map<string, string[]>(doc.blocks.map((b) => [b.id, []]));
  const inputs = new Set(doc.blocks.filter((b) => b.type === "input").map((b) => b.id));
  for (const w of doc.wires) if (!inputs.has(w.to) && !next.get(w.from)!.includes(w.to)) next.get(w.from)!.push(w.to);
  return next;
}

/** Every elementary circuit, each once (from its lowest block in document order). */
export function elementaryLoops(doc: DiagramDocument): string[][] {
  const next = successors(doc);
  const order = new Map(doc.blocks.map((b, i) => [b.id, i]));
  const loops: string[][] = [];
  let walks = 0;
  for (const start of doc.blocks.map((b) => b.id)) {
    const walk = (at: string, path: string[]) => {
      if (++walks > MAX_WALKS) throw new RangeError("too many walks for the path/loop reference");
      for (const to of next.get(at)!) {
        if (to === start) loops.push([...path]);
        else if (order.get(to)! > order.get(start)! && !path.includes(to)) walk(to, [...path, to]);
      }
    };
    walk(start, [start]);
  }
  return loops;
}

/** Every forward path from `input` to `output`, no block twice. */
export function forwardPaths(doc: DiagramDocument, input: string, output: string): string[][] {
  const next = successors(doc);
  const paths: string[][] = [];
  let walks = 0;
  const walk = (at: string, path: string[]) => {
    if (++walks > MAX_WALKS) throw new RangeError("too many walks for the path/loop reference");
    if (at === output) return void paths.push(path);
    for (const to of next.get(at)!) if (!path.includes(to)) walk(to, [...path, to]);
  };
  walk(input, [input]);
  return paths;
}

/** The paths, the loops touching them (transitively) and their blocks for one pair. */
export function pairStructure(doc: DiagramDocument, input: string, output: string, loops = elementaryLoops(doc)): PairStructure {
  const paths = forwardPaths(doc, input, output);
  const reached = new Set(paths.flat());
  const touching: string[][] = [];
  let rest = paths.length ? loops : [];
  for (let grew = true; grew; ) {
    grew = false;
    const left: string[][] = [];
    for (const loop of rest) {
      if (loop.some((b) => reached.has(b))) {
        touching.push(loop);
        loop.forEach((b) => reached.add(b));
        grew = true;
      } else left.push(loop);
    }
    rest = left;
  }
  reached.delete(input);
  reached.delete(output);
  return { paths, loops: touching, blocks: reached };
}
