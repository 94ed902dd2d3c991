import type { NodeTypes } from "@xyflow/react";
import { BLOCK_KINDS } from "@shared/diagram/blockKinds";
import type { Block, BlockType } from "@shared/diagram/schema";
import { capital } from "@shared/text/words";
import { ArrowLeftToLine, ArrowRightFromLine, CircleDot, CirclePlus, Divide, Hourglass, Triangle } from "lucide-react";
import type { ReactNode } from "react";
import { DelayNode, GainNode, IntegratorNode, TransferNode } from "@/features/editor/components/nodes/ExpressionNodes";
import { SumNode } from "@/features/editor/components/nodes/SumNode";
import { BranchNode, InputNode, OutputNode } from "@/features/editor/components/nodes/TerminalNodes";

/** What the editor shows and does for one block kind; its signal role lives in shared/diagram/blockKinds.ts, its outline in shared/geometry/blockShape.ts. */
export interface BlockKindView {
  /** The kind's name in labels and headings: the shared row's name, capitalised. */
  name: string;
  /** The rail's short caption, glyph and hint; `key` is the digit that adds one. */
  rail: { short: string; key: string; glyph: ReactNode; hint: string };
  /** Prefix of new block ids: "G" gives G1, G2, … */
  idPrefix: string;
  /** The block as it first appears. */
  create: (id: string) => Block;
  /** The canvas node that draws it. */
  node: NodeTypes[string];
  /** The label of its expression field in the properties panel; null for a kind without an expression. */
  exprLabel: string | null;
}

const nameOf = (type: BlockType) => capital(BLOCK_KINDS[type].name);

/** Every block kind of the editor in one row each, in rail order; a new kind in the schema makes the compiler ask for its row. */
export const BLOCK_VIEWS: Record<BlockType, BlockKindView> = {
  input: {
    name: nameOf("input"),
    rail: { short: "Input", key: "1", glyph: <ArrowRightFromLine className="size-5" />, hint: "External signal: reference or disturbance" },
    idPrefix: "r",
    create: (id) => ({ id, type: "input" }),
    node: InputNode,
    exprLabel: null,
  },
  sum: {
    name: nameOf("sum"),
    rail: { short: "Sum", key: "2", glyph: <CirclePlus className="size-5" />, hint: "Adds and subtracts its inputs" },
    idPrefix: "e",
    // A comparator: + reference, − feedback.
    create: (id) => ({ id, type: "sum", signs: ["+", "-"] }),
    node: SumNode,
    exprLabel: null,
  },
  gain: {
    name: nameOf("gain"),
    rail: { short: "Gain", key: "3", glyph: <Triangle className="size-5 rotate-90" />, hint: "Static gain, no s" },
    idPrefix: "k",
    create: (id) => ({ id, type: "gain", expr: "1" }),
    node: GainNode,
    exprLabel: "Gain (no s)",
  },
  transfer: {
    name: nameOf("transfer"),
    rail: { short: "Transfer", key: "4", glyph: <Divide className="size-5" />, hint: "Rational function of s" },
    idPrefix: "G",
    create: (id) => ({ id, type: "transfer", expr: "1/(s + 1)" }),
    node: TransferNode,
    exprLabel: "Transfer function of s",
  },
  integrator: {
    name: nameOf("integrator"),
    rail: { short: "Integrator", key: "5", glyph: <span className="font-serif text-xl leading-5 italic">∫</span>, hint: "1/s" },
    idPrefix: "int",
    create: (id) => ({ id, type: "integrator" }),
    node: IntegratorNode,
    exprLabel: null,
  },
  delay: {
    name: nameOf("delay"),
    rail: { short: "Dead time", key: "8", glyph: <Hourglass className="size-5" />, hint: "e^(−sT): delays its input by T seconds" },
    idPrefix: "d",
    create: (id) => ({ id, type: "delay", expr: "0.1" }),
    node: DelayNode,
    exprLabel: "Dead time T in seconds (no s)",
  },
  branch: {
    name: nameOf("branch"),
    rail: { short: "Pickoff point", key: "6", glyph: <CircleDot className="size-5" />, hint: "One signal to several wires" },
    idPrefix: "p",
    create: (id) => ({ id, type: "branch" }),
    node: BranchNode,
    exprLabel: null,
  },
  output: {
    name: nameOf("output"),
    rail: { short: "Output", key: "7", glyph: <ArrowLeftToLine className="size-5" />, hint: "A signal to observe" },
    idPrefix: "y",
    create: (id) => ({ id, type: "output" }),
    node: OutputNode,
    exprLabel: null,
  },
};

/** The kinds in rail order. */
export const BLOCK_TYPES = Object.keys(BLOCK_VIEWS) as BlockType[];
