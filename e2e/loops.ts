/**
 * Unity negative feedback around one plant G: r → e(+, −) → G → y, with G fed back into e's minus port, laid out
 * left to right. Example: unityLoop("Positioner loop", "K/(s*(s+2))", { K: 4 }) closes to K/(s² + 2s + K).
 */
export const unityLoop = (title: string, plant: string, parameters: Record<string, unknown> = {}) => ({
  format: "loopwright-diagram",
  version: 1,
  title,
  parameters,
  blocks: [
    { id: "r", type: "input" },
    { id: "e", type: "sum", signs: ["+", "-"] },
    { id: "G", type: "transfer", expr: plant },
    { id: "y", type: "output" },
  ],
  wires: [
    { id: "w1", from: "r", to: "e", port: 0 },
    { id: "w2", from: "e", to: "G" },
    { id: "w3", from: "G", to: "y" },
    { id: "w4", from: "G", to: "e", port: 1 },
  ],
  layout: { r: { x: 0, y: 0 }, e: { x: 160, y: 0 }, G: { x: 320, y: 0 }, y: { x: 520, y: 0 } },
});
