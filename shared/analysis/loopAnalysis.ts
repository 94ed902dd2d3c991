// Everything read from the loop gain at the break: margins, delay margin, sensitivity peak, Nyquist.
import type { RatFn } from "@shared/algebra/ratfn";
import { bode, frequencyRange, ratEvalComplex, type BodeData, type Zpk } from "@shared/analysis/frequency";
import type { BreakPoint } from "@shared/analysis/loopGain";
import { delayMargin, margins, sensitivityPeak, type Margins } from "@shared/analysis/margins";
import { transferAt } from "@shared/analysis/nominal";
import { nyquist, type Nyquist } from "@shared/analysis/nyquist";
import { flatRoots, rootsOf } from "@shared/analysis/poles";
import { upLatex, upLead, upText, type UPoly } from "@shared/analysis/upoly";
import { qToNumber } from "@shared/algebra/rational";

export interface LoopAnalysis {
  breakPoint: { index: number; label: string; chosen: "given" | "default" };
  L: { numerator: string; denominator: string; latex: string };
  margins: Margins;
  delayMargin: number | null;
  sensitivityPeak: { value: number; omega: number } | null;
  nyquist: Nyquist;
  bode: BodeData;
  /** L(jω) on the Bode frequencies (ω > 0); the ω < 0 half is its mirror image. */
  nyquistPoints: [number, number][];
  notes: string[];
}

/** Gain, zeros and poles of num/den for the Bode plot. Example: zpkOf(2, s + 1) → { gain: 2, zeros: [], poles: [[−1, 0]] }. */
export const zpkOf = (num: UPoly, den: UPoly): Zpk => ({
  gain: qToNumber(upLead(num)) / qToNumber(upLead(den)),
  zeros: flatRoots(rootsOf(num)),
  poles: flatRoots(rootsOf(den)),
});

/** Plain text and LaTeX of num/den. Example: fractionText(1, s + 1) → { numerator: "1", denominator: "s + 1", … }. */
export const fractionText = (num: UPoly, den: UPoly) => ({
  numerator: upText(num),
  denominator: upText(den),
  latex: den.length === 1 ? upLatex(num) : `\\frac{${upLatex(num)}}{${upLatex(den)}}`,
});

/**
 * The loop quantities at parameter values; null (with a note) when L is identically 0 there.
 * Example: unity negative feedback around 2/(s + 1)^3 → gain margin 12.04 dB, Nyquist verdict stable.
 */
export function analyzeLoop(bp: BreakPoint, L: RatFn, values: Readonly<Record<string, number>>): LoopAnalysis | string {
  const { num, den } = transferAt(L, values);
  if (!num.length) return `The loop gain at ${bp.label} is 0: no loop passes through that wire.`;
  const m = margins(num, den);
  const ny = nyquist(num, den);
  const notes = [...m.notes];
  const stable = ny.verdict === "stable";
  if (!stable) notes.push("The delay margin is not defined: the closed loop at the break is not stable.");
  const zpk = zpkOf(num, den);
  const range = frequencyRange(zpk, [...m.gainCrossovers, ...m.phaseCrossovers].map((c) => c.omega));
  const b = bode(zpk, range);
  const peak = sensitivityPeak(num, den);
  if (!peak) notes.push("The sensitivity peak is infinite: the closed loop has a pole on the imaginary axis.");
  return {
    breakPoint: { index: bp.index, label: bp.label, chosen: bp.chosen },
    L: fractionText(num, den),
    margins: m,
    delayMargin: stable ? delayMargin(m.gainCrossovers) : null,
    sensitivityPeak: peak,
    nyquist: ny,
    bode: b,
    nyquistPoints: b.omega.map((w) => ratEvalComplex(num, den, [0, w])),
    notes,
  };
}
