import type { Field } from "@shared/algebra/field";
import { SingularLoopError, solveDense } from "@shared/reduce/dense";
import type { Part, SfgEdge, SfgNode } from "@shared/reduce/graph";
import { feedbackPair, type Action } from "@shared/reduce/plan";
import { folded, freed, head, link, produce, removeNode, tail, unlink, type Outside, type RuleContext } from "@shared/reduce/ruleEdits";
import { edgeName, times } from "@shared/reduce/trace";

/*
 * The reduction rules on the signal-flow graph. Each is an exact elimination: a node goes away (or a loop is
 * closed) and the transfer between the remaining nodes is unchanged; each says which of the edges' parts stay
 * outside its equivalent block. Example: applyPlan(ctx, node, "series") turns a → n → b into one edge a → b.
 */

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
  const { field } = ctx;
  const ins = sorted(node.ins);
  const outs = sorted(node.outs);
  const own = folded(ctx, node);
  removeNode(ctx, node);
  if (ins.length === 1 && outs.length === 1) {
    const [a, b] = [ins[0], outs[0]];
    const keep = a.label !== null ? a : b;
    const bare = keep === a ? b : a;
    link(ctx, a.from, b.to, {
      gain: signed(field, bare.sign, keep.gain),
      label: keep.label,
      sign: a.sign * b.sign > 0 ? 1 : -1,
      ...(keep === a
        ? { before: a.before, after: [...a.after, ...own, ...b.before, ...b.after] }
        : { before: [...a.before, ...a.after, ...own, ...b.before], after: b.after }),
    });
    return;
  }
  // A junction next to a bare wire: the edges on its other side slide across it unchanged, each carrying the
  // wire and the junction's block along (they share them until a step merges them).
  const upstream = ins.length === 1; // the wire feeds a pickoff point; otherwise it leaves a junction
  const wire = upstream ? ins[0] : outs[0];
  const through = upstream ? [...wire.before, ...own] : [...own, ...wire.before];
  for (const e of upstream ? outs : ins) {
    const parts: Outside = upstream
      ? { before: [...through, ...e.before], after: e.after }
      : e.label === null
        ? { before: [...e.before, ...through], after: [] }
        : { before: e.before, after: [...e.after, ...through] };
    link(ctx, upstream ? wire.from : e.from, upstream ? e.to : wire.to, {
      gain: signed(field, wire.sign, e.gain),
      label: e.label,
      sign: e.sign * wire.sign > 0 ? 1 : -1,
      ...parts,
    });
  }
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
  // The two branches share the wires up to where they split and from where they join again.
  const before = commonStart(head(p), head(q));
  const after = commonStart([...tail(p)].reverse(), [...tail(q)].reverse()).reverse();
  const ends = [...new Set([ctx.graph.node(p.from), ctx.graph.node(p.to)])];
  const draft = produce(ctx, "parallel", [p, q], ends, gain, { before, after }, (eq) => `Parallel: ${a} and ${b} ${where} combine into ${eq} = ${a} + ${b}.`);
  unlink(ctx, p);
  unlink(ctx, q);
  link(ctx, p.from, p.to, draft);
}

/** The longest common beginning of two part lists. Example: [w0, p, w1] and [w0, p, w3] → [w0, p]. */
function commonStart(a: readonly Part[], b: readonly Part[]): Part[] {
  let n = 0;
  while (n < a.length && n < b.length && a[n].key === b[n].key) n++;
  return a.slice(0, n);
}

function series<T>(ctx: RuleContext<T>, node: SfgNode<T>): void {
  const [a] = node.ins;
  const [b] = node.outs;
  const gain = ctx.field.mul(a.gain, b.gain);
  const [x, y] = [edgeName(a), edgeName(b)];
  const outside = { before: a.before, after: b.after };
  const draft = produce(ctx, "series", [a, b], [node], gain, outside, (eq) => `Series: ${x} then ${y} become ${eq} = ${times(x, y)}.`);
  removeNode(ctx, node);
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
  unlink(ctx, edge);
  unlink(ctx, loop);
  // The closed loop takes the node's junction when it is left with nothing to join or split, and the parts up to it.
  const closes = freed(ctx, node, onInput ? { ins: 1, outs: 0 } : { ins: 0, outs: 1 });
  const outside = onInput
    ? { before: head(edge), after: closes || edge.label === null ? [] : edge.after }
    : { before: closes && edge.label !== null ? [] : edge.before, after: edge.after };
  const draft = produce(ctx, "feedback", [edge, loop], [node], gain, outside, (eq) =>
    `Feedback: the loop ${edgeName(loop)} around ${node.id} closes over ${g} (${side}): ${eq} = ${g}/(${rd}).`,
  );
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
  const [sum, end] = [ctx.graph.node(forward.from), node];
  unlink(ctx, forward);
  unlink(ctx, back);
  // The closed loop takes the summing junction (and a pickoff it leaves with one branch), with the parts next to them.
  const outside = {
    before: freed(ctx, sum, { ins: 0, outs: 1 }) ? [] : head(forward),
    after: freed(ctx, end, { ins: 1, outs: 0 }) || forward.label === null ? [] : forward.after,
  };
  const draft = produce(ctx, "feedback", [forward, back], [sum, end], gain, outside, (eq) =>
    `Feedback: ${f} ${how} becomes ${eq} = ${f}/(${returnDifference(f, back)}).`,
  );
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
  removeNode(ctx, node);
  if (heir) {
    const [from, to] = ends(heir);
    link(ctx, from, to, {
      gain: signed(ctx.field, heir.sign, block.gain),
      label: block.label,
      sign: heir.sign * block.sign > 0 ? 1 : -1,
      ...(isSum ? { before: [...head(heir), ...block.before], after: block.after } : { before: block.before, after: [...block.after, ...tail(heir)] }),
    });
  }
  copies.forEach((e, k) => {
    const last = k === copies.length - 1;
    const gain = isSum ? ctx.field.mul(e.gain, block.gain) : ctx.field.mul(block.gain, e.gain);
    const consumed = last && !heir ? [e, block] : [e];
    // A bare wire gets a copy of the block itself (with the wire's sign), not a product.
    const x = e.label === null ? `the wire ${isSum ? `from ${e.from}` : `to ${e.to}`}` : edgeName(e);
    const value = e.label === null ? times(e.sign < 0 ? "−" : "", G) : isSum ? times(x, G) : times(G, x);
    const outside = isSum ? { before: head(e), after: block.after } : { before: block.before, after: tail(e) };
    const draft = produce(ctx, rule, consumed, last ? [node] : [], gain, outside, (eq) =>
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
  const divided = hasLoop ? `/(${returnDifference(null, pivot.loop!)})` : "";
  removeNode(ctx, node);
  ins.forEach((i, a) =>
    outs.forEach((o, b) => {
      const lastIn = b === outs.length - 1;
      const lastOut = a === ins.length - 1;
      const consumed = [...(lastIn ? [i] : []), ...(lastOut ? [o] : []), ...(lastIn && lastOut && pivot.loop ? [pivot.loop] : [])];
      const gain = field.mul(scaled[a], o.gain);
      const [x, y] = [edgeName(i), edgeName(o)];
      const outside = { before: head(i), after: tail(o) };
      const draft = produce(ctx, "eliminate-node", consumed, lastIn && lastOut ? [node] : [], gain, outside, (eq) =>
        `Eliminate ${node.id}: ${x} then ${y} become ${eq} = ${times(x, y)}${divided}.`,
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
  removeNode(ctx, node);
}

/**
 * Applies the planned rule at a node; false when its pivot turned out to be zero (the node is then blocked).
 * Example: applyPlan(ctx, n, "series").
 */
export function applyPlan<T>(ctx: RuleContext<T>, node: SfgNode<T>, action: Action): boolean {
  const applied = apply(ctx, node, action);
  ctx.footprint?.settle(ctx.graph);
  return applied;
}

function apply<T>(ctx: RuleContext<T>, node: SfgNode<T>, action: Action): boolean {
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
  const draft = produce(ctx, "eliminate-node", graph.edges(), inner, gain, { before: [], after: [] }, (eq) =>
    `Eliminate ${names} together (a loop of gain exactly 1 around one of them leaves no single-node pivot): ${input} to ${output} becomes ${eq}.`,
  );
  for (const n of inner) removeNode(ctx, n);
  for (const e of [...graph.node(output).ins]) unlink(ctx, e);
  link(ctx, input, output, draft);
  ctx.footprint?.settle(graph);
}
