// Micro-benchmark of wire routing around blocks (shared/geometry) on the editor bench's 500-block ladder: prints a
// table of figures, asserts nothing. The overview and the SVG export route every wire once per change; a live
// canvas wire asks the grid for its nearby blocks on every store update (pan frames too).
import { performance } from "node:perf_hooks";
import { boxOf, fallbackPosition, inPoint, outPoint } from "@shared/geometry/blockBox";
import { indexBoxes, obstaclesFor } from "@shared/geometry/boxIndex";
import { wireRoute } from "@shared/geometry/wireRoute";
import { ladderDiagram, placedOnGrid } from "./diagrams";

const BLOCKS = 500;
const REPS = 50;
const doc = placedOnGrid(ladderDiagram(BLOCKS));
const blocks = new Map(doc.blocks.map((b, i) => [b.id, { block: b, box: boxOf(b, doc.layout?.[b.id] ?? fallbackPosition(i), undefined) }]));
const ends = doc.wires.map((w) => {
  const [s, t] = [blocks.get(w.from)!, blocks.get(w.to)!];
  const entry = inPoint(t.block, t.box, w.port);
  return { w, s, t, entry };
});

/** Mean of REPS runs after one warm-up, in ms. */
function time(run: () => unknown): number {
  run();
  const t0 = performance.now();
  for (let i = 0; i < REPS; i += 1) run();
  return (performance.now() - t0) / REPS;
}

const plain = time(() => ends.map(({ s, t, entry }) => wireRoute({ source: outPoint(s.box), target: entry.at, side: entry.side, sourceBox: s.box, targetBox: t.box })));
const index = indexBoxes([...blocks].map(([id, b]) => [id, b.box] as const));
const build = time(() => indexBoxes([...blocks].map(([id, b]) => [id, b.box] as const)));
const queries = time(() => ends.map(({ w, s, t }) => obstaclesFor(index, w.from, w.to, s.box, t.box)));
const around = time(() => {
  const fresh = indexBoxes([...blocks].map(([id, b]) => [id, b.box] as const));
  return ends.map(({ w, s, t, entry }) =>
    wireRoute({ source: outPoint(s.box), target: entry.at, side: entry.side, sourceBox: s.box, targetBox: t.box, obstacles: obstaclesFor(fresh, w.from, w.to, s.box, t.box) }),
  );
});
const near = ends.reduce((sum, { w, s, t }) => sum + obstaclesFor(index, w.from, w.to, s.box, t.box).length, 0) / ends.length;

console.table([
  { figure: `route ${ends.length} wires, no obstacles`, ms: plain.toFixed(3) },
  { figure: `build the grid of ${BLOCKS} boxes`, ms: build.toFixed(3) },
  { figure: `nearby blocks for every wire (a live wire's per-update query, all wires)`, ms: queries.toFixed(3) },
  { figure: `grid + route every wire around its nearby blocks (overview/export per change)`, ms: around.toFixed(3) },
  { figure: `nearby blocks per wire, mean`, ms: near.toFixed(1) },
]);
