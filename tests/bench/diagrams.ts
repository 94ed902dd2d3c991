import { DIAGRAM_FORMAT, DIAGRAM_VERSION, type Block, type DiagramDocument, type Wire } from "@shared/diagram/schema";

/**
 * Deterministic diagram generators for the reduction benchmark and the cross-check tests. Every
 * loop runs through a strictly proper first-order section, so every generated diagram is well posed.
 * With `symbolic`, the sections use the three parameters K, a and tau.
 */
export interface GeneratorOptions {
  symbolic?: boolean;
}

export type BenchFamily = "ladder" | "nested";

const SYMBOLIC_PARAMETERS = { K: 2, a: 1.5, tau: { value: 0.5, unit: "s" } };

/** Exact decimal text of a small coefficient picked from the index (no float noise). */
const coeff = (i: number, choices: readonly string[]): string => choices[i % choices.length];

const POLES = ["1", "1.5", "2", "0.5", "3", "2.5", "4"];
const GAINS = ["2", "1", "3", "0.5", "1.5"];
const FEEDBACK = ["0.5", "0.25", "1", "0.75"];

/** First-order section i: numeric `b/(s + p)` or, with parameters, one of three symbolic shapes. */
const sectionExpr = (i: number, symbolic: boolean): string => {
  if (!symbolic) return `${coeff(i, GAINS)}/(s + ${coeff(i, POLES)})`;
  const shapes = [`K/(tau*s + 1)`, `${coeff(i, GAINS)}/(s + a)`, `K/(s + ${coeff(i, POLES)})`];
  return shapes[i % shapes.length];
};

class Builder {
  readonly blocks: Block[] = [];
  readonly wires: Wire[] = [];
  add(block: Block): string {
    this.blocks.push(block);
    return block.id;
  }
  wire(from: string, to: string, port?: number): void {
    this.wires.push(port === undefined ? { from, to } : { from, to, port });
  }
  /** Series gains `trim1, trim2, …` between `from` and the output so the block count is exact. */
  finish(from: string, total: number, title: string, symbolic: boolean): DiagramDocument {
    let last = from;
    for (let i = 1; this.blocks.length < total - 1; i++) {
      const id = this.add({ id: `trim${i}`, type: "gain", expr: coeff(i, GAINS) });
      this.wire(last, id);
      last = id;
    }
    this.add({ id: "y", type: "output" });
    this.wire(last, "y");
    return {
      format: DIAGRAM_FORMAT,
      version: DIAGRAM_VERSION,
      title,
      parameters: symbolic ? { ...SYMBOLIC_PARAMETERS } : {},
      blocks: this.blocks,
      wires: this.wires,
    };
  }
}

/**
 * A ladder of exactly `blocks` blocks (≥ 6): first-order sections e_i → t_i, each closed by its own
 * unity feedback and interlocked with the next one through a gain k_i (t_{i+1} → k_i → e_i).
 * Example: ladderDiagram(20).blocks.length === 20.
 */
export function ladderDiagram(blocks: number, opts: GeneratorOptions = {}): DiagramDocument {
  if (blocks < 6) throw new RangeError("a ladder needs at least 6 blocks");
  const symbolic = opts.symbolic ?? false;
  const sections = Math.floor((blocks - 1) / 3);
  const b = new Builder();
  b.add({ id: "r", type: "input" });
  let prev = "r";
  for (let i = 1; i <= sections; i++) {
    const last = i === sections;
    b.add({ id: `e${i}`, type: "sum", signs: last ? ["+", "-"] : ["+", "-", "-"] });
    b.add({ id: `t${i}`, type: "transfer", expr: sectionExpr(i, symbolic) });
    b.wire(prev, `e${i}`, 0);
    b.wire(`e${i}`, `t${i}`);
    b.wire(`t${i}`, `e${i}`, 1);
    if (!last) {
      b.add({ id: `k${i}`, type: "gain", expr: coeff(i, FEEDBACK) });
      b.wire(`t${i + 1}`, `k${i}`);
      b.wire(`k${i}`, `e${i}`, 2);
    }
    prev = `t${i}`;
  }
  return b.finish(prev, blocks, `Generated ladder, ${blocks} blocks`, symbolic);
}

/**
 * A chain of exactly `blocks` blocks (≥ 6) of stages e_i → t_i → p_i (explicit pickoff), each with a
 * minor loop p_i → g_i → e_i, and nested outer loops: the pickoff of stage m+1−i feeds back into e_i.
 * Example: nestedLoopChain(30, { symbolic: true }).parameters has K, a and tau.
 */
export function nestedLoopChain(blocks: number, opts: GeneratorOptions = {}): DiagramDocument {
  if (blocks < 6) throw new RangeError("a nested-loop chain needs at least 6 blocks");
  const symbolic = opts.symbolic ?? false;
  const stages = Math.floor((blocks - 2) / 4);
  const b = new Builder();
  b.add({ id: "r", type: "input" });
  let prev = "r";
  for (let i = 1; i <= stages; i++) {
    const outer = stages + 1 - i > i;
    b.add({ id: `e${i}`, type: "sum", signs: outer ? ["+", "-", "-"] : ["+", "-"] });
    b.add({ id: `t${i}`, type: "transfer", expr: sectionExpr(i, symbolic) });
    b.add({ id: `p${i}`, type: "branch" });
    b.add({ id: `g${i}`, type: "gain", expr: coeff(i, FEEDBACK) });
    b.wire(prev, `e${i}`, 0);
    b.wire(`e${i}`, `t${i}`);
    b.wire(`t${i}`, `p${i}`);
    b.wire(`p${i}`, `g${i}`);
    b.wire(`g${i}`, `e${i}`, 1);
    if (outer) b.wire(`p${stages + 1 - i}`, `e${i}`, 2);
    prev = `p${i}`;
  }
  return b.finish(prev, blocks, `Generated nested-loop chain, ${blocks} blocks`, symbolic);
}

/** The generator of a family. Example: benchDiagram("ladder", 150).blocks.length === 150. */
export function benchDiagram(family: BenchFamily, blocks: number, opts: GeneratorOptions = {}): DiagramDocument {
  return family === "ladder" ? ladderDiagram(blocks, opts) : nestedLoopChain(blocks, opts);
}

/** The diagram placed on a grid (row-major in block order), unless it already has a layout: what the canvas benches open. */
export function placedOnGrid(doc: DiagramDocument): DiagramDocument {
  if (doc.layout) return doc;
  const columns = Math.ceil(Math.sqrt(doc.blocks.length));
  const layout = Object.fromEntries(doc.blocks.map((b, i) => [b.id, { x: (i % columns) * 224, y: Math.floor(i / columns) * 144 }]));
  return { ...doc, layout };
}
