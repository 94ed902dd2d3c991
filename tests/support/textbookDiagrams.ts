import type { DiagramDocument } from "@shared/diagram/schema";
import { makeDoc } from "./docBuilder";

/**
 * Hand-made diagrams whose closed forms are known from the literature. `expected` maps
 * "input→output" to the closed form written as a formula in s and the parameters (diagram syntax),
 * typed in from the textbook result — never from any program's output.
 */
export interface TextbookCase {
  name: string;
  source: string;
  doc: DiagramDocument;
  expected: Record<string, string>;
  /** Δ(s) times every block's denominator, worked out by hand (up to a constant factor). */
  characteristic: string;
}

const G1 = "1/(s + 1)";
const G2 = "2/(s + 2)";

export const TEXTBOOK_CASES: TextbookCase[] = [
  {
    name: "unity-feedback second-order servo",
    source: "from memory: Ogata, Modern Control Engineering, standard second-order system wn^2/(s^2 + 2*zeta*wn*s + wn^2)",
    doc: makeDoc(
      [
        { id: "r", type: "input" },
        { id: "e", type: "sum", signs: ["+", "-"] },
        { id: "g", type: "transfer", expr: "wn^2/(s*(s + 2*zeta*wn))" },
        { id: "y", type: "output" },
      ],
      ["r->e:0", "e->g", "g->y", "g->e:1"],
      { wn: 2, zeta: { value: 0.5 } },
    ),
    expected: { "r→y": "wn^2/(s^2 + 2*zeta*wn*s + wn^2)" },
    characteristic: "s^2 + 2*zeta*wn*s + wn^2",
  },
  {
    name: "non-unity feedback G/(1+GH)",
    source: "from memory: Nise, Control Systems Engineering, canonical feedback form C/R = G/(1 + G*H)",
    doc: makeDoc(
      [
        { id: "r", type: "input" },
        { id: "e", type: "sum", signs: ["+", "-"] },
        { id: "g", type: "transfer", expr: "K/(s + 1)" },
        { id: "h", type: "transfer", expr: "1/(s + 5)" },
        { id: "y", type: "output" },
      ],
      ["r->e:0", "e->g", "g->y", "g->h", "h->e:1"],
      { K: 3 },
    ),
    expected: { "r→y": "K*(s + 5)/((s + 1)*(s + 5) + K)" },
    characteristic: "(s + 1)*(s + 5) + K",
  },
  {
    name: "servo with velocity (tachometer) minor loop",
    source: "from memory: Ogata, Modern Control Engineering, servo with a velocity (tachometer) minor loop; gain ahead of the inner junction gives C/R = K/(s^2 + (1 + kt)*s + K)",
    doc: makeDoc(
      [
        { id: "r", type: "input" },
        { id: "e1", type: "sum", signs: ["+", "-"] },
        { id: "amp", type: "gain", expr: "K" },
        { id: "e2", type: "sum", signs: ["+", "-"] },
        { id: "motor", type: "transfer", expr: "1/(s + 1)" },
        { id: "pos", type: "integrator" },
        { id: "tach", type: "gain", expr: "kt" },
        { id: "y", type: "output" },
      ],
      ["r->e1:0", "e1->amp", "amp->e2:0", "e2->motor", "motor->pos", "pos->y", "motor->tach", "tach->e2:1", "pos->e1:1"],
      { K: 5, kt: 0.2 },
    ),
    expected: { "r→y": "K/(s^2 + (1 + kt)*s + K)" },
    characteristic: "s^2 + (1 + kt)*s + K",
  },
  {
    name: "two non-touching loops in cascade",
    source: "from memory: Dorf & Bishop, Modern Control Systems, Mason's gain formula with non-touching loops: Δ = 1 − (L1 + L2) + L1*L2",
    doc: makeDoc(
      [
        { id: "r", type: "input" },
        { id: "e1", type: "sum", signs: ["+", "-"] },
        { id: "g1", type: "transfer", expr: G1 },
        { id: "h1", type: "gain", expr: "0.5" },
        { id: "e2", type: "sum", signs: ["+", "-"] },
        { id: "g2", type: "transfer", expr: G2 },
        { id: "h2", type: "gain", expr: "4" },
        { id: "y", type: "output" },
      ],
      ["r->e1:0", "e1->g1", "g1->h1", "h1->e1:1", "g1->e2:0", "e2->g2", "g2->h2", "h2->e2:1", "g2->y"],
    ),
    expected: { "r→y": `(${G1})*(${G2})/(1 + (${G1})*0.5 + (${G2})*4 + (${G1})*0.5*(${G2})*4)` },
    characteristic: "(s + 1.5)*(s + 10)",
  },
  {
    name: "interlocked loops with an outer unity loop",
    source: "from memory: Ogata, Modern Control Engineering, reduction of interlocked loops by moving a pickoff point (signs as drawn here): C/R = G1*G2*G3/(1 + G1*G2*H1 + G2*G3*H2 + G1*G2*G3)",
    doc: makeDoc(
      [
        { id: "r", type: "input" },
        { id: "e1", type: "sum", signs: ["+", "-", "-"] },
        { id: "g1", type: "transfer", expr: G1 },
        { id: "e2", type: "sum", signs: ["+", "-"] },
        { id: "g2", type: "transfer", expr: G2 },
        { id: "p", type: "branch" },
        { id: "g3", type: "integrator" },
        { id: "h1", type: "gain", expr: "0.5" },
        { id: "h2", type: "gain", expr: "3" },
        { id: "y", type: "output" },
      ],
      ["r->e1:0", "e1->g1", "g1->e2:0", "e2->g2", "g2->p", "p->g3", "p->h1", "h1->e1:1", "g3->h2", "h2->e2:1", "g3->y", "g3->e1:2"],
    ),
    expected: {
      "r→y": `(${G1})*(${G2})*(1/s)/(1 + (${G1})*(${G2})*0.5 + (${G2})*(1/s)*3 + (${G1})*(${G2})*(1/s))`,
    },
    characteristic: "s*(s + 1)*(s + 2) + s + 6*(s + 1) + 2",
  },
  {
    name: "parallel paths, a loop that does not touch one path",
    source: "from memory: Kuo, Automatic Control Systems, Mason's gain formula: a forward path's cofactor Δ_k keeps the loops it does not touch",
    doc: makeDoc(
      [
        { id: "r", type: "input" },
        { id: "p", type: "branch" },
        { id: "ga", type: "gain", expr: "K" },
        { id: "e", type: "sum", signs: ["+", "-"] },
        { id: "gb", type: "transfer", expr: "3/(s + 2)" },
        { id: "h", type: "transfer", expr: "1/(s + 4)" },
        { id: "j", type: "sum", signs: ["+", "+"] },
        { id: "y", type: "output" },
      ],
      ["r->p", "p->ga", "p->e:0", "e->gb", "gb->h", "h->e:1", "ga->j:0", "gb->j:1", "j->y"],
      { K: 0.5 },
    ),
    expected: { "r→y": "K + (3/(s + 2))/(1 + 3/((s + 2)*(s + 4)))" },
    characteristic: "(s + 2)*(s + 4) + 3",
  },
  {
    name: "reference and disturbance inputs, output and control effort",
    source: "from memory: Nise, Control Systems Engineering, disturbance rejection: C = G1*G2/(1 + G1*G2)*R + G2/(1 + G1*G2)*D",
    doc: makeDoc(
      [
        { id: "r", type: "input" },
        { id: "d", type: "input" },
        { id: "e", type: "sum", signs: ["+", "-"] },
        { id: "c", type: "transfer", expr: "K*(s + 2)/s" },
        { id: "u", type: "output" },
        { id: "j", type: "sum", signs: ["+", "+"] },
        { id: "plant", type: "transfer", expr: "1/(s^2 + 3*s)" },
        { id: "y", type: "output" },
      ],
      ["r->e:0", "e->c", "c->u", "c->j:0", "d->j:1", "j->plant", "plant->y", "plant->e:1"],
      { K: 4 },
    ),
    expected: {
      "r→y": "(K*(s + 2)/s)*(1/(s^2 + 3*s))/(1 + (K*(s + 2)/s)*(1/(s^2 + 3*s)))",
      "d→y": "(1/(s^2 + 3*s))/(1 + (K*(s + 2)/s)*(1/(s^2 + 3*s)))",
      "r→u": "(K*(s + 2)/s)/(1 + (K*(s + 2)/s)*(1/(s^2 + 3*s)))",
      "d→u": "-(K*(s + 2)/s)*(1/(s^2 + 3*s))/(1 + (K*(s + 2)/s)*(1/(s^2 + 3*s)))",
    },
    characteristic: "s*(s^2 + 3*s) + K*(s + 2)",
  },
];
