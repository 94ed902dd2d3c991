// The analysis stage's contract: what the editor and the CLI ask of it and what it answers.
import type { Analysis } from "@shared/analysis/analyze";
import type { LocusGeometry } from "@shared/analysis/locusGeometry";
import type { RootLocus } from "@shared/analysis/sweep";
import type { Problem } from "@shared/diagram/problems";

/** What the sweep tab draws for one parameter: the root locus over all its gains and step responses across its range. */
export interface SweepData {
  parameter: string;
  range: [number, number];                           // the slider range: a highlighted part of the locus
  locus: RootLocus;                                  // closed-loop poles from 0 to far out, others at the slider values
  negativeLocus: RootLocus | null;                   // from 0 down to far out, when asked (or the range reaches below 0)
  geometry: LocusGeometry | null;                    // poles, zeros, asymptotes, breakaways, crossings (χ affine in it)
  locusNote: string | null;                          // why there are no landmarks, else null
  overlay: { value: number; points: [number, number][] }[]; // step responses at 5 values across the range
  current: number;                                   // the slider value now
}

/** What the analysis of a reduction is asked for: the pair, the break, parameter values and the swept parameter. */
export interface AnalysisQuery {
  /** Input and output block ids of the pair; null: the first input and the first output. */
  input: string | null;
  output: string | null;
  /** Wire id where the loop is broken for margins; null: the default break. */
  break: string | null;
  /** Slider values; parameters not named here take their nominal value. */
  values: Record<string, number>;
  /** Settling band as a fraction (0.02 = 2 %). */
  settlingBand: number;
  /** Parameter of the sweep tab; null: the first parameter. */
  sweepParameter: string | null;
  /** Compute the sweep (root locus and step overlay) — only while its tab is open, as it costs the most. */
  withSweep: boolean;
  /** Order of the Padé approximant of each dead time (1–10); absent: 3. */
  padeOrder?: number;
  /** Also sample the locus over negative gains (−∞ → 0). */
  negative?: boolean;
}

/** One row of the slider table: the parameter table's nominal value, range, unit and description. */
export interface ParameterInfo {
  name: string;
  nominal: number;
  range: [number, number];
  unit?: string;
  description?: string;
}

/** The wire the loop was broken at: "given" by the user or found by the default rule. */
export interface BreakWire {
  id: string;
  chosen: "given" | "default";
}

export type AnalysisAnswer =
  | { ok: true; analysis: Analysis; parameters: ParameterInfo[]; sweep: SweepData | null; breakWire: BreakWire | null }
  /** `parameters` is empty when the pair itself could not be prepared. */
  | { ok: false; problems: Problem[]; parameters: ParameterInfo[] };
