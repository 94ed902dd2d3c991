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

/**
 * A PI speed loop in unity feedback: r → e(+, −) → pi = Kp(Ti·s + 1)/(Ti·s) → g → pickoff b → y, b fed back into e.
 * Example: piLoop("8/(0.25*s + 1)", { Kp: 2, Ti: 0.4 }) closes to (64s + 160)/(s² + 68s + 160).
 */
export const piLoop = (g: string, parameters: DiagramDocument["parameters"], title?: string): DiagramDocument =>
  makeDoc(
    [
      { id: "r", type: "input" },
      { id: "e", type: "sum", signs: ["+", "-"] },
      { id: "pi", type: "transfer", expr: "Kp*(Ti*s + 1)/(Ti*s)" },
      { id: "g", type: "transfer", expr: g },
      { id: "b", type: "branch" },
      { id: "y", type: "output" },
    ],
    ["r->e:0", "e->pi", "pi->g", "g->b", "b->y", "b->e:1"],
    parameters,
    title,
  );

/**
 * Unity feedback around a controller c, a dead time d of T seconds and a plant g: r → e(+, −) → c → d → g → y.
 * Example: delayedLoop("2", "0.5", "1/(s + 1)") closes to 2e^(−0.5s)/(s + 1 + 2e^(−0.5s)).
 */
export const delayedLoop = (c: string, T: string, g: string, parameters: DiagramDocument["parameters"] = {}): DiagramDocument =>
  makeDoc(
    [
      { id: "r", type: "input" },
      { id: "e", type: "sum", signs: ["+", "-"] },
      { id: "c", type: "transfer", expr: c },
      { id: "d", type: "delay", expr: T },
      { id: "g", type: "transfer", expr: g },
      { id: "y", type: "output" },
    ],
    ["r->e:0", "e->c", "c->d", "d->g", "g->y", "g->e:1"],
    parameters,
  );
