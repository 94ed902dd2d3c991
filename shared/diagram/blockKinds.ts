import type { ExprNode } from "@shared/expr/ast";
import type { Block, BlockType } from "@shared/diagram/schema";

/**
 * How a block acts on the signals wired into it — which is also how the reducer builds it into the
 * signal-flow graph (shared/reduce/build.ts switches over it, exhaustively).
 * - "source": an external signal; wires into it are ignored (input).
 * - "sink": observes the one signal wired into it (output).
 * - "sum": adds the signals at its ports, each with its port's sign.
 * - "branch": passes its one input on to every wire out of it.
 * - "scale": its output is its input times the block's transfer, a rational function of s.
 * - "delay": its output is its input delayed by the dead time T of its expression, e^(−sT) — not a rational
 *   function of s: the exact algebra carries e^(−sT) as a symbol of its own (shared/expr/names.ts delaySymbol).
 */
export type SignalRole = "source" | "sink" | "sum" | "branch" | "scale" | "delay";

/** The `expr` field of a kind that has one: whether s may appear in it. */
type ExpressionSpec<B> = B extends { expr: string } ? { mayContainS: boolean; sRefusal?: string } : null;

export interface BlockKind<B extends Block = Block> {
  /** The kind's one name in every sentence, lower case: the rail, the panels and the problems all say it. */
  name: string;
  role: SignalRole;
  /** The block's own expression, when it has one (the type checker ties this to the schema's `expr`). */
  expression: ExpressionSpec<B>;
  /** A "scale" kind without an expression: its fixed transfer (integrator: 1/s). */
  fixedTransfer: ExprNode | null;
}

const ONE_OVER_S: ExprNode = { kind: "div", left: { kind: "num", num: 1n, den: 1n }, right: { kind: "s" } };

/**
 * What every block kind is, in one row each; adding a kind to the schema makes the type checker ask for its row.
 * Example: BLOCK_KINDS.transfer.expression?.mayContainS === true.
 */
export const BLOCK_KINDS: { readonly [T in BlockType]: BlockKind<Extract<Block, { type: T }>> } = {
  input: { name: "input", role: "source", expression: null, fixedTransfer: null },
  output: { name: "output", role: "sink", expression: null, fixedTransfer: null },
  sum: { name: "summing junction", role: "sum", expression: null, fixedTransfer: null },
  branch: { name: "pickoff point", role: "branch", expression: null, fixedTransfer: null },
  gain: { name: "gain", role: "scale", expression: { mayContainS: false }, fixedTransfer: null },
  transfer: { name: "transfer function", role: "scale", expression: { mayContainS: true }, fixedTransfer: null },
  integrator: { name: "integrator", role: "scale", expression: null, fixedTransfer: ONE_OVER_S },
  delay: {
    name: "dead time",
    role: "delay",
    expression: { mayContainS: false, sRefusal: "a dead time: its expression is T in seconds (the block is e^(-sT))" },
    fixedTransfer: null,
  },
};

export type ExpressionBlock = Extract<Block, { expr: string }>;

/** The block has an `expr` field. Example: hasExpression({ id: "c", type: "gain", expr: "2" }) === true. */
export const hasExpression = (block: Block): block is ExpressionBlock => BLOCK_KINDS[block.type].expression !== null;

/** The kind's name with its block id, as problems name a block. Example: namedBlock({ id: "p1", type: "branch" }) === 'pickoff point "p1"'. */
export const namedBlock = (block: Pick<Block, "id" | "type">): string => `${BLOCK_KINDS[block.type].name} "${block.id}"`;

/** The block's output is its input times a gain of its own (a transfer, or a dead time's e^(−sT)). Example: carriesGain(integrator) === true. */
export const carriesGain = (block: Block): boolean => BLOCK_KINDS[block.type].role === "scale" || BLOCK_KINDS[block.type].role === "delay";

/** The kind's row. Example: kindOf(block).role === "scale" for a transfer block. */
export const kindOf = (block: Block): BlockKind => BLOCK_KINDS[block.type] as BlockKind;
