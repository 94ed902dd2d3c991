import type { Field } from "@shared/algebra/field";
import { spend, type Budget } from "@shared/reduce/budget";
import { SingularLoopError, solveDense } from "@shared/reduce/dense";
import type { SfgEdge, SfgNode, SignalFlowGraph } from "@shared/reduce/graph";
import { feedbackPair, type Action, type Blocked } from "@shared/reduce/plan";
import type { ReductionRule } from "@shared/reduce/result";
import { edgeName, times, type StepLog } from "@shared/reduce/trace";

/**
 * The reduction rules on the signal-flow graph. Each is an exact elimination: a node goes away (or a
 * loop is closed) and the transfer between the remaining nodes is unchanged. `pivots` collects the pivots
 * (return differences) when asked: their product is det(I − A) of the graph reduced.
 * Example: applyPlan(ctx, node, "series") turns a → n → b into one edge a → b with the product gain.
 */
export interface RuleContext<T> {
  readonly graph: SignalFlowGraph<T>;
  readonly field: Field<T>;
  /** Null in determinant-only runs: no trace, equivalent blocks are not named. */
  readonly log: StepLog<T> | null;
  readonly budget: Budget;
  readonly terminals: ReadonlySet<string>;
  readonly blocked: Blocked;
  /** Factors of det(I − A) collected so far, or null when the determinant is not wanted. */
  readonly pivots: T[] | null;
}

type Draft<T> = Omit<SfgEdge<T>, "seq" | "from" | "to">;

const ANONYMOUS = "~";

function link<T>(ctx: RuleContext<T>, from: string, to: string, draft: Draft<T>): void {
  spend(ctx.budget, 1);
  ctx.graph.addEdge({ from, to, gain: draft.gain, label: draft.label, sign: draft.sign, blocks: draft.blocks, wires: draft.wires });
}

/** Records the step (when tracing) and returns the new equivalent block's draft. */
function produce<T>(
  ctx: RuleContext<T>,
  rule: ReductionRule,
  consumed: SfgEdge<T>[],
  extra: (string | null)[],
  gain: T,
  describe: (eq: string) => string,
): Draft<T> {
  const label = ctx.log ? ctx.log.record(rule, consumed, extra, gain, describe) : ANONYMOUS;
  return { gain, label, sign: 1, blocks: [], wires: [] };
}

const signed = <T>(field: Field<T>, sign: 1 | -1, gain: T): T => (sign > 0 ? gain : field.neg(gain));

/** "1 − F·H" with the feedback edge's sign folded in: "1 + F·h" for negative feedback, "1 + F" for a bare wire. */
function returnDifference<T>(forward: string | null, back: SfgEdge<T>): string {
  const loop = times(...(forward === null ? [] : [forward]), edgeName(back));
  return loop.startsWith("−") ? `1 + ${loop.slice(1)}` : `1 − ${loop}`;
}

const sorted = <T>(edges: Iterable<SfgEdge<T>>): SfgEdge<T>[] => [...edges].sort((a, b) => a.seq - b.seq);

/** Pivot 1 − L of a node's self-loop (one when it has none); null when it is zero. */
function pivotOf<T>(ctx: RuleContext<T>, node: SfgNode<T>): { value: T; loop: SfgEdge<T> | null } | null {
  const loop = node.loops.size > 0 ? sorted(node.loops)[0] : null;
  if (!loop) return { value: ctx.field.one, loop };
  const value = ctx.field.sub(ctx.field.one, loop.gain);
  if (ctx.field.isZero(value)) {
    ctx.blocked.pivot.set(node.id, loop.seq);
    return null;
  }
  return { value, loop };
}

function tidy<T>(ctx: RuleContext<T>, node: SfgNode<T>): void {
  const { graph, field } = ctx;
  const ins = sorted(node.ins);
  const outs = sorted(node.outs);
  graph.removeNode(node.id);
  if (ins.length === 1 && outs.length === 1) {
    const [a, b] = [ins[0], outs[0]];
    const keep = a.label !== null ? a : b;
    const bare = keep === a ? b : a;
    link(ctx, a.from, b.to, {
      gain: signed(field, bare.sign, keep.gain),
      label: keep.label,
      sign: a.sign * b.sign > 0 ? 1 : -1,
      blocks: [...a.blocks, ...b.blocks, ...(node.own ? [node.own] : [])],
      wires: [...a.wires, ...b.wires],
    });
    return;
  }
  // A junction next to a bare wire: the edges on its other side slide across it unchanged; the first
  // one carries the wire and the junction's block along.
  const upstream = ins.length === 1; // the wire feeds a pickoff point; otherwise it leaves a junction
  const wire = upstream ? ins[0] : outs[0];
  (upstream ? outs : ins).forEach((e, k) => {
    const carried = k === 0 ? { blocks: [...wire.blocks, ...(node.own ? [node.own] : [])], wires: wire.wires } : null;
    const join = (mine: readonly string[], theirs: readonly string[] = []) =>
      upstream ? [...theirs, ...mine] : [...mine, ...theirs];
    link(ctx, upstream ? wire.from : e.from, upstream ? e.to : wire.to, {
      gain: signed(field, wire.sign, e.gain),
      label: e.label,
      sign: e.sign * wire.sign > 0 ? 1 : -1,
      blocks: join(e.blocks, carried?.blocks),
      wires: join(e.wires, carried?.wires),
    });
  });
}

function parallel<T>(ctx: RuleContext<T>, node: SfgNode<T>): void {
  let pair: [SfgEdge<T>, SfgEdge<T>] | null = null;
  if (node.loops.size > 1) {
    const loops = sorted(node.loops);
    pair = [loops[0], loops[1]];
  } else {
    const seen = new Map<string, SfgEdge<T>>();
    for (const e of sorted(node.ins)) {
      const first = seen.get(e.from);
      if (first) {
        pair = [first, e];
        break;
      }
      seen.set(e.from, e);
    }
  }
  if (!pair) return;
  const [p, q] = pair;
  const gain = ctx.field.add(p.gain, q.gain);
  const [a, b] = [edgeName(p), edgeName(q)];
  const where = p.from === p.to ? `around ${p.from}` : `from ${p.from} to ${p.to}`;
  const draft = produce(ctx, "parallel", [p, q], [], gain, (eq) => `Parallel: ${a} and ${b} ${where} combine into ${eq} = ${a} + ${b}.`);
  ctx.graph.removeEdge(p);
  ctx.graph.removeEdge(q);
  link(ctx, p.from, p.to, draft);
}

function series<T>(ctx: RuleContext<T>, node: SfgNode<T>): void {
  const [a] = node.ins;
  const [b] = node.outs;
  const gain = ctx.field.mul(a.gain, b.gain);
  const [x, y] = [edgeName(a), edgeName(b)];
  const draft = produce(ctx, "series", [a, b], [node.own], gain, (eq) => `Series: ${x} then ${y} become ${eq} = ${times(x, y)}.`);
  ctx.graph.removeNode(node.id);
  link(ctx, a.from, b.to, draft);
}

function feedbackSelf<T>(ctx: RuleContext<T>, node: SfgNode<T>): boolean {
  const pivot = pivotOf(ctx, node);
  if (!pivot) return false;
  const loop = pivot.loop!;
  const onInput = node.ins.size === 1;
  const edge = onInput ? [...node.ins][0] : [...node.outs][0];
  const gain = ctx.field.div(edge.gain, pivot.value);
  const [g, rd] = [edgeName(edge), returnDifference(null, loop)];
  const side = onInput ? `into ${node.id}` : `out of ${node.id}`;
  const draft = produce(ctx, "feedback", [edge, loop], [], gain, (eq) =>
    `Feedback: the loop ${edgeName(loop)} around ${node.id} closes over ${g} (${side}): ${eq} = ${g}/(${rd}).`,
  );
  ctx.graph.removeEdge(edge);
  ctx.graph.removeEdge(loop);
  link(ctx, edge.from, edge.to, draft);
  ctx.pivots?.push(pivot.value);
  return true;
}

function feedbackOfPair<T>(ctx: RuleContext<T>, node: SfgNode<T>): boolean {
  const { forward, back } = feedbackPair(ctx.graph, node, ctx.terminals)!;
  const { field } = ctx;
  // F/(1 − F·H) as 1/(1/F − H): one addition instead of two products; the pivot is F·(1/F − H).
  const inverse = field.isZero(forward.gain) ? null : field.sub(field.div(field.one, forward.gain), back.gain);
  if (inverse && field.isZero(inverse)) {
    ctx.blocked.pair.set(node.id, `${forward.seq}:${back.seq}`);
    return false;
  }
  const gain = inverse ? field.div(field.one, inverse) : field.zero;
  const f = edgeName(forward);
  const kind = back.sign < 0 ? "negative" : "positive";
  const how =
    back.label === null
      ? `with unity ${kind} feedback to ${forward.from}`
      : `with ${edgeName(back)} fed back to ${forward.from} (${kind} feedback)`;
  const draft = produce(ctx, "feedback", [forward, back], [], gain, (eq) =>
    `Feedback: ${f} ${how} becomes ${eq} = ${f}/(${returnDifference(f, back)}).`,
  );
  ctx.graph.removeEdge(forward);
  ctx.graph.removeEdge(back);
  link(ctx, forward.from, forward.to, draft);
  if (inverse) ctx.pivots?.push(forward.gain, inverse);
  return true;
}

/**
 * Moves a junction past the block after it (or a pickoff point before the block ahead of it): every edge
 * on the far side gets its own copy of the block. A bare wire takes the block's place without a copy.
 */
function move<T>(ctx: RuleContext<T>, node: SfgNode<T>, rule: "move-sum" | "move-pickoff"): void {
  const isSum = rule === "move-sum";
  const block = isSum ? [...node.outs][0] : [...node.ins][0];
  const others = sorted(isSum ? node.ins : node.outs);
  const heir = others.find((e) => e.label === null) ?? null;
  const copies = others.filter((e) => e !== heir);
  const ends = (e: SfgEdge<T>): [string, string] => (isSum ? [e.from, block.to] : [block.from, e.to]);
  const G = edgeName(block);
  ctx.graph.removeNode(node.id);
  if (heir) {
    const [from, to] = ends(heir);
    link(ctx, from, to, {
      gain: signed(ctx.field, heir.sign, block.gain),
      label: block.label,
      sign: heir.sign * block.sign > 0 ? 1 : -1,
      blocks: isSum ? [...heir.blocks, ...block.blocks] : [...block.blocks, ...heir.blocks],
      wires: isSum ? [...heir.wires, ...block.wires] : [...block.wires, ...heir.wires],
    });
  }
  copies.forEach((e, k) => {
    const last = k === copies.length - 1;
    const gain = isSum ? ctx.field.mul(e.gain, block.gain) : ctx.field.mul(block.gain, e.gain);
    const consumed = last && !heir ? [e, block] : [e];
    // A bare wire gets a copy of the block itself (with the wire's sign), not a product.
    const x = e.label === null ? `the wire ${isSum ? `from ${e.from}` : `to ${e.to}`}` : edgeName(e);
    const value = e.label === null ? times(e.sign < 0 ? "−" : "", G) : isSum ? times(x, G) : times(G, x);
    const draft = produce(ctx, rule, consumed, last ? [node.own] : [], gain, (eq) =>
      isSum
        ? `Move junction ${node.id} past ${G}: ${x} becomes ${eq} = ${value}.`
        : `Move pickoff point ${node.id} before ${G}: ${x} becomes ${eq} = ${value}.`,
    );
    const [from, to] = ends(e);
    link(ctx, from, to, draft);
  });
}

/** General elimination: every path in → node → out becomes one edge; a self-loop divides by 1 − L. */
function eliminate<T>(ctx: RuleContext<T>, node: SfgNode<T>): boolean {
  const pivot = pivotOf(ctx, node);
  if (!pivot) return false;
  const { field } = ctx;
  const ins = sorted(node.ins);
  const outs = sorted(node.outs);
  const hasLoop = pivot.loop !== null;
  const scaled = ins.map((i) => (hasLoop ? field.div(i.gain, pivot.value) : i.gain));
  const tail = hasLoop ? `/(${returnDifference(null, pivot.loop!)})` : "";
  ctx.graph.removeNode(node.id);
  ins.forEach((i, a) =>
    outs.forEach((o, b) => {
      const lastIn = b === outs.length - 1;
      const lastOut = a === ins.length - 1;
      const consumed = [...(lastIn ? [i] : []), ...(lastOut ? [o] : []), ...(lastIn && lastOut && pivot.loop ? [pivot.loop] : [])];
      const gain = field.mul(scaled[a], o.gain);
      const [x, y] = [edgeName(i), edgeName(o)];
      const draft = produce(ctx, "eliminate-node", consumed, lastIn && lastOut ? [node.own] : [], gain, (eq) =>
        `Eliminate ${node.id}: ${x} then ${y} become ${eq} = ${times(x, y)}${tail}.`,
      );
      link(ctx, i.from, o.to, draft);
    }),
  );
  if (hasLoop) ctx.pivots?.push(pivot.value);
  return true;
}

/** A node nothing enters or nothing leaves: it only contributes its pivot to the determinant. */
function drop<T>(ctx: RuleContext<T>, node: SfgNode<T>): void {
  const loop = sorted(node.loops)[0];
  if (loop) ctx.pivots?.push(ctx.field.sub(ctx.field.one, loop.gain));
  ctx.graph.removeNode(node.id);
}

/**
 * Applies the planned rule at a node; false when its pivot turned out to be zero (the node is then blocked).
 * Example: applyPlan(ctx, n, "series").
 */
export function applyPlan<T>(ctx: RuleContext<T>, node: SfgNode<T>, action: Action): boolean {
  switch (action) {
    case "tidy":
      tidy(ctx, node);
      return true;
    case "drop":
      drop(ctx, node);
      return true;
    case "parallel":
      parallel(ctx, node);
      return true;
    case "series":
      series(ctx, node);
      return true;
    case "feedback-self":
      return feedbackSelf(ctx, node);
    case "feedback-pair":
      return feedbackOfPair(ctx, node);
    case "move-sum":
    case "move-pickoff":
      move(ctx, node, action);
      return true;
    case "eliminate":
      return eliminate(ctx, node);
  }
}

/**
 * The last resort: every node left is solved together in one general elimination (see solveDense), leaving
 * the single edge input → output. Throws SingularLoopError when the remaining loops have no unique solution.
 * Example: two junctions each feeding itself with gain exactly 1 are eliminated together.
 */
export function solveTogether<T>(ctx: RuleContext<T>, input: string, output: string): void {
  const { graph, field } = ctx;
  const inner = [...graph.nodes.values()].filter((n) => n.id !== input && n.id !== output);
  const { solution, det } = solveDense(field, graph, input);
  if (!solution) throw new SingularLoopError(inner.map((n) => n.id));
  ctx.pivots?.push(det);
  const gain = solution.get(output)!;
  const names = inner.map((n) => n.id).join(", ");
  const draft = produce(ctx, "eliminate-node", graph.edges(), inner.map((n) => n.own), gain, (eq) =>
    `Eliminate ${names} together (a loop of gain exactly 1 around one of them leaves no single-node pivot): ${input} to ${output} becomes ${eq}.`,
  );
  for (const n of inner) graph.removeNode(n.id);
  for (const e of [...graph.node(output).ins]) graph.removeEdge(e);
  link(ctx, input, output, draft);
}
