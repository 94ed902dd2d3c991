import type { DiagramDocument } from "@shared/diagram/schema";

/** Demo loops of the invented Brightwater Mills line 3, as Loopwright diagram documents. */
const doc = (title: string, rest: Pick<DiagramDocument, "parameters" | "blocks" | "wires" | "layout">): DiagramDocument => ({
  format: "loopwright-diagram",
  version: 1,
  title,
  ...rest,
});

export const demoDiagrams: { title: string; description: string; document: DiagramDocument }[] = [
  {
    title: "Felt conveyor speed loop",
    description: "PI speed controller on the felt conveyor drive, tachometer feedback.",
    document: doc("Felt conveyor speed loop", {
      parameters: { Kp: { value: 2, description: "proportional gain" }, Ti: { value: 0.4, unit: "s", description: "integral time" } },
      blocks: [
        { id: "w_ref", type: "input", label: "speed set-point" },
        { id: "err", type: "sum", signs: ["+", "-"] },
        { id: "pi", type: "transfer", expr: "Kp*(Ti*s + 1)/(Ti*s)", label: "PI controller" },
        { id: "drive", type: "transfer", expr: "8/(0.25*s + 1)", label: "drive and belt" },
        { id: "tacho", type: "gain", expr: "1", label: "tachometer" },
        { id: "w", type: "output", label: "belt speed" },
      ],
      wires: [
        { id: "w1", from: "w_ref", to: "err", port: 0 },
        { id: "w2", from: "err", to: "pi" },
        { id: "w3", from: "pi", to: "drive" },
        { id: "w4", from: "drive", to: "w" },
        { id: "w5", from: "drive", to: "tacho" },
        { id: "w6", from: "tacho", to: "err", port: 1 },
      ],
      // One row at port height 120 (each block's top is 120 less half its height). A fraction's box is 60 tall
      // in the figure and 48 on the canvas: its top at 93 puts its ports 3 px off the row in both, within the
      // straight-wire tolerance. The tachometer sits below and right of the drive, so its feedback returns
      // under the whole row.
      layout: {
        w_ref: { x: 40, y: 102 },
        err: { x: 280, y: 96 },
        pi: { x: 400, y: 93 },
        drive: { x: 600, y: 93 },
        w: { x: 800, y: 102 },
        tacho: { x: 760, y: 220 },
      },
    }),
  },
  {
    title: "Stock chest level loop",
    description: "Level of the stock chest under a consistency-driven outflow disturbance.",
    document: doc("Stock chest level loop", {
      parameters: { K: { value: 1.5, description: "level controller gain" } },
      blocks: [
        { id: "h_ref", type: "input", label: "level set-point" },
        { id: "q_out", type: "input", label: "outflow disturbance" },
        { id: "e", type: "sum", signs: ["+", "-"] },
        { id: "ctrl", type: "gain", expr: "K", label: "level controller" },
        { id: "valve", type: "transfer", expr: "1/(2*s + 1)", label: "inlet valve" },
        { id: "net", type: "sum", signs: ["+", "-"] },
        { id: "tank", type: "integrator", label: "chest volume" },
        { id: "h", type: "output", label: "level" },
      ],
      wires: [
        { id: "w1", from: "h_ref", to: "e", port: 0 },
        { id: "w2", from: "e", to: "ctrl" },
        { id: "w3", from: "ctrl", to: "valve" },
        { id: "w4", from: "valve", to: "net", port: 0 },
        { id: "w5", from: "q_out", to: "net", port: 1 },
        { id: "w6", from: "net", to: "tank" },
        { id: "w7", from: "tank", to: "h" },
        { id: "w8", from: "tank", to: "e", port: 1 },
      ],
      // One row at port height 120; the disturbance below it, entering the second junction from underneath,
      // low enough that the level feedback passes between them.
      layout: {
        h_ref: { x: 40, y: 102 },
        e: { x: 280, y: 96 },
        ctrl: { x: 390, y: 92 },
        valve: { x: 560, y: 93 },
        net: { x: 720, y: 96 },
        tank: { x: 840, y: 96 },
        h: { x: 980, y: 102 },
        q_out: { x: 480, y: 200 },
      },
    }),
  },
  {
    title: "Slitter knife position servo",
    description: "Position loop around a velocity minor loop on the slitter knife carriage.",
    document: doc("Slitter knife position servo", {
      parameters: { Kpos: { value: 12, description: "position gain" }, Kv: { value: 0.8, description: "velocity gain" } },
      blocks: [
        { id: "x_ref", type: "input", label: "position set-point" },
        { id: "ep", type: "sum", signs: ["+", "-"] },
        { id: "cp", type: "gain", expr: "Kpos" },
        { id: "ev", type: "sum", signs: ["+", "-"] },
        { id: "cv", type: "gain", expr: "Kv" },
        { id: "motor", type: "transfer", expr: "40/(0.05*s + 1)", label: "motor and carriage" },
        { id: "v_pick", type: "branch" },
        { id: "pos", type: "integrator", label: "position" },
        { id: "x", type: "output", label: "knife position" },
      ],
      wires: [
        { id: "w1", from: "x_ref", to: "ep", port: 0 },
        { id: "w2", from: "ep", to: "cp" },
        { id: "w3", from: "cp", to: "ev", port: 0 },
        { id: "w4", from: "ev", to: "cv" },
        { id: "w5", from: "cv", to: "motor" },
        { id: "w6", from: "motor", to: "v_pick" },
        { id: "w7", from: "v_pick", to: "pos" },
        { id: "w8", from: "v_pick", to: "ev", port: 1 },
        { id: "w9", from: "pos", to: "x" },
        { id: "w10", from: "pos", to: "ep", port: 1 },
      ],
      // The position loop at port height 120, the velocity loop raised to 60 (the fraction 3 px lower, as above), so the two feedback wires return
      // at different heights (84 + 24 under the velocity loop, 144 + 24 under the position loop).
      layout: {
        x_ref: { x: 40, y: 102 },
        ep: { x: 300, y: 96 },
        cp: { x: 400, y: 92 },
        ev: { x: 540, y: 36 },
        cv: { x: 640, y: 32 },
        motor: { x: 780, y: 33 },
        v_pick: { x: 940, y: 52 },
        pos: { x: 1040, y: 96 },
        x: { x: 1160, y: 102 },
      },
    }),
  },
];
