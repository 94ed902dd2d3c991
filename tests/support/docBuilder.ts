import { DIAGRAM_FORMAT, DIAGRAM_VERSION, type Block, type DiagramDocument, type Wire } from "@shared/diagram/schema";

/**
 * Compact notation for hand-written test diagrams: wires as "from->to" or "from->to:port".
 * Example: makeDoc([{ id: "r", type: "input" }, { id: "y", type: "output" }], ["r->y"]).
 */
export function makeDoc(
  blocks: Block[],
  wires: string[],
  parameters: DiagramDocument["parameters"] = {},
  title = "Test diagram",
): DiagramDocument {
  return {
    format: DIAGRAM_FORMAT,
    version: DIAGRAM_VERSION,
    title,
    parameters,
    blocks,
    wires: wires.map((text, i): Wire => {
      const m = /^([^-]+)->([^:]+)(?::(\d+))?$/.exec(text);
      if (!m) throw new Error(`bad wire notation "${text}"`);
      const wire: Wire = { id: `w${i + 1}`, from: m[1], to: m[2] };
      if (m[3] !== undefined) wire.port = Number(m[3]);
      return wire;
    }),
  };
}

/**
 * Unity negative feedback around (s − 1)/(s + 2) · 1/(s − 1): the unstable mode s = 1 cancels in T(s) = 1/(s + 3)
 * but stays in the loop (common practice: unstable pole-zero cancellation).
 */
export const hiddenUnstableLoop = (): DiagramDocument =>
  makeDoc(
    [
      { id: "r", type: "input" },
      { id: "e", type: "sum", signs: ["+", "-"] },
      { id: "c", type: "transfer", expr: "(s - 1)/(s + 2)" },
      { id: "g", type: "transfer", expr: "1/(s - 1)" },
      { id: "b", type: "branch" },
      { id: "y", type: "output" },
    ],
    ["r->e:0", "e->c", "c->g", "g->b", "b->y", "b->e:1"],
  );

/**
 * Unity negative feedback around one transfer block g: r → e(+, −) → g → pickoff b → y, with b fed back into e.
 * Example: unityFeedback("K/(s*(s + 2))", { K: 4 }) closes to K/(s^2 + 2s + K).
 */
export const unityFeedback = (g: string, parameters: DiagramDocument["parameters"] = {}, title?: string): DiagramDocument =>
  makeDoc(
    [
      { id: "r", type: "input" },
      { id: "e", type: "sum", signs: ["+", "-"] },
      { id: "g", type: "transfer", expr: g },
      { id: "b", type: "branch" },
      { id: "y", type: "output" },
    ],
    ["r->e:0", "e->g", "g->b", "b->y", "b->e:1"],
    parameters,
    title,
  );
