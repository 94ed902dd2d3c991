import type { Block } from "@shared/diagram/schema";
import { blocksById } from "@shared/diagram/graph";
import { freshId, wireIds } from "@/features/editor/commands/ids";
import { done, refuse, type EditorDoc, type Outcome } from "@/features/editor/commands/types";

export interface ConnectArgs {
  from: string;
  to: string;
  /** Input port of a summing junction; ignored for other targets. */
  port?: number;
}

const signWord = (sign: "+" | "-") => (sign === "+" ? "+" : "−");

/** Why a wire from → to (port) would break the format, or null when it may be drawn. */
export function connectionRefusal(doc: EditorDoc, { from, to, port }: ConnectArgs): string | null {
  const blocks = blocksById(doc);
  const source = blocks.get(from);
  const target = blocks.get(to);
  if (!source) return `Block "${from}" does not exist`;
  if (!target) return `Block "${to}" does not exist`;
  if (source.type === "output") return `Output block "${from}" only receives a signal; start the wire at another block's output`;
  if (target.type === "input") return `Input block "${to}" is an external signal and takes no incoming wire`;
  const targetPort = target.type === "sum" ? port : 0;
  if (target.type === "sum" && (targetPort === undefined || targetPort < 0 || targetPort >= target.signs.length)) {
    return `Summing junction "${to}" has ports 0…${target.signs.length - 1}; pick one of them`;
  }
  const occupant = doc.wires.find((w) => w.to === to && (target.type !== "sum" || w.port === targetPort));
  if (occupant) return occupiedReason(target, targetPort ?? 0, occupant.id, occupant.from);
  return null;
}

function occupiedReason(target: Block, port: number, wireId: string, from: string): string {
  if (target.type === "sum") {
    return `Port ${port} (${signWord(target.signs[port])}) of summing junction "${target.id}" is already fed by wire "${wireId}" from "${from}"; add a port or delete that wire first`;
  }
  return `Block "${target.id}" already takes its input from wire "${wireId}" (from "${from}"); combine signals with a summing junction`;
}

/** Draws a wire with a fresh id `w<n>` and selects it, or refuses with the reason. */
export function connect(doc: EditorDoc, args: ConnectArgs): Outcome {
  const reason = connectionRefusal(doc, args);
  if (reason) return refuse(reason);
  const target = doc.blocks.find((b) => b.id === args.to) as Block;
  const id = freshId("w", wireIds(doc));
  const wire = { id, from: args.from, to: args.to, ...(target.type === "sum" ? { port: args.port } : {}) };
  return done({ ...doc, wires: [...doc.wires, wire] }, { blocks: [], wires: [id] });
}

/** The free input ports a wire from `from` could enter, in document order: for keyboard connecting. */
export function openInputs(doc: EditorDoc, from: string): ConnectArgs[] {
  return doc.blocks.flatMap((b) => {
    const ports = b.type === "sum" ? b.signs.map((_, i) => i) : b.type === "input" ? [] : [0];
    return ports
      .map((port) => ({ from, to: b.id, ...(b.type === "sum" ? { port } : {}) }))
      .filter((args) => connectionRefusal(doc, args) === null);
  });
}
