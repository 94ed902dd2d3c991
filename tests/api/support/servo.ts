/**
 * Unity negative feedback around K/(s(s+2)): T = K/(s^2 + 2s + K) (from memory: Ogata, Modern Control Engineering,
 * the standard second-order servo example). The last wire carries an unknown field: readers must keep it.
 */
export const servoDocument = (title: string) => ({
  format: "loopwright-diagram",
  version: 1,
  title,
  parameters: { K: 4 },
  blocks: [
    { id: "r", type: "input" },
    { id: "e", type: "sum", signs: ["+", "-"] },
    { id: "g", type: "transfer", expr: "K/(s*(s+2))" },
    { id: "y", type: "output" },
  ],
  wires: [
    { id: "w1", from: "r", to: "e", port: 0 },
    { id: "w2", from: "e", to: "g" },
    { id: "w3", from: "g", to: "y" },
    { id: "w4", from: "g", to: "e", port: 1, note: "kept: readers keep unknown fields" },
  ],
});
