// The analysis stage's entry, for the editor's worker and the CLI alike. It takes the reducer's exact result;
// a small cache lets a slider move skip the symbolic part: prepareAnalysis runs once per (reduction, pair,
// break); stable ranges, the root locus and the step overlay are kept while the values they depend on stay.
import { AlgebraError } from "@shared/algebra/errors";
import { polyParams } from "@shared/algebra/poly";
import { ratDenominator } from "@shared/algebra/ratfn";
import { analyzeAt, type Analysis } from "@shared/analysis/analyze";
import type { AnalysisAnswer, AnalysisQuery, BreakWire, ParameterInfo, SweepData } from "@shared/analysis/answer";
import { checkDelayRange } from "@shared/analysis/delayRange";
import { AnalysisError } from "@shared/analysis/errors";
import { prepareAnalysis, type Prepared, type PreparedAnalysis } from "@shared/analysis/prepare";
import type { AnalysisResult } from "@shared/analysis/schema";
import { stableSet, type StableSet } from "@shared/analysis/stableSet";
import { analysisSummary } from "@shared/analysis/summary";
import { parameterRange, stepOverlay, sweepValues } from "@shared/analysis/sweep";
import { wholeLocus } from "@shared/analysis/wholeLocus";
import type { Problem } from "@shared/diagram/problems";
import { reduceDocumentExact, type ExactReduction } from "@shared/reduce/reduceDiagram";

/** Points of the root locus (per sign of the gain, besides its landmarks) and step responses in the overlay. */
export const LOCUS_POINTS = 200;
export const OVERLAY_VALUES = 5;
/** Entries kept per cache before it is emptied (a slider drag visits many values). */
const CACHE_LIMIT = 64;

/** A failed analysis as a Problem: a bad parameter value points at its row of the parameter table. */
function problemOf(err: AnalysisError | AlgebraError): Problem {
  const subject =
    err instanceof AnalysisError && err.subject && err.code === "bad-value"
      ? { field: `parameters.${err.subject}` }
      : err instanceof AnalysisError && err.subject && err.code === "delay-range"
        ? { blockId: err.subject, field: "expr" }
        : {};
  return { severity: "error", code: err.code, message: err.message, ...subject };
}

function parameterInfo(p: PreparedAnalysis): ParameterInfo[] {
  return p.parameters.map((name) => {
    const spec = (p.doc.parameters ?? {})[name];
    const info: ParameterInfo = { name, nominal: p.nominal[name], range: parameterRange(p.doc, name) };
    if (typeof spec === "object" && spec.unit) info.unit = spec.unit;
    if (typeof spec === "object" && spec.description) info.description = spec.description;
    return info;
  });
}

/** Values of every parameter except `name`, as a cache key. */
const othersKey = (values: Record<string, number>, name: string) =>
  JSON.stringify(Object.entries(values).filter(([k]) => k !== name).sort(([a], [b]) => (a < b ? -1 : 1)));

class Cache<T> {
  private readonly map = new Map<string, T>();
  get(key: string, make: () => T): T {
    const hit = this.map.get(key);
    if (hit !== undefined) return hit;
    if (this.map.size >= CACHE_LIMIT) this.map.clear();
    const made = make();
    this.map.set(key, made);
    return made;
  }
  clear() {
    this.map.clear();
  }
}

/** The analyser: call it with a reduction and a query; it keeps the last preparation and what hangs off it. */
export type Analyzer = (reduction: ExactReduction, q: AnalysisQuery) => AnalysisAnswer;

/**
 * A stateful analyser. A new reduction object, pair or break prepares afresh; the same reduction with new
 * values only substitutes them. Example: createAnalyzer()(reduction, { input: null, …, values: { K: 2 } }).
 */
export function createAnalyzer(): Analyzer {
  let last: { reduction: ExactReduction; input: string | null; output: string | null; brk: string | null; pade: number | undefined } | null = null;
  let prepared: Prepared | null = null;
  let conditions: string[] | null = null;
  // The last answer and its query: a request that changes nothing the analysis reads (a block moved) reuses it.
  let answered: { query: string; answer: AnalysisAnswer } | null = null;
  const sets = new Cache<StableSet>();
  const sweeps = new Cache<Omit<SweepData, "current">>();

  return (reduction, q) => {
    const notes: string[] = [];
    const brk = q.break;
    const pade = q.padeOrder;
    const fresh = !last || last.reduction !== reduction || last.input !== q.input || last.output !== q.output || last.brk !== brk || last.pade !== pade;
    if (fresh) {
      last = null; // set again only once the preparation has not thrown
      sets.clear();
      sweeps.clear();
      prepared = prepareAnalysis(reduction, { input: q.input ?? undefined, output: q.output ?? undefined, break: brk ?? undefined, padeOrder: pade });
      last = { reduction, input: q.input, output: q.output, brk, pade };
      answered = null;
    }
    const asked = JSON.stringify(q);
    if (answered?.query === asked) return answered.answer;
    if (!prepared?.ok) return { ok: false, problems: prepared?.problems ?? [], parameters: [] };
    const p = prepared.prepared;
    const values = Object.fromEntries(Object.entries(q.values).filter(([name, v]) => p.parameters.includes(name) && Number.isFinite(v)));
    try {
      const parameters = parameterInfo(p);
      const at = { ...p.nominal, ...values };
      if (p.delay) checkDelayRange(p.delay.delays, at);
      let analysis: Analysis;
      if (fresh) {
        // The first analysis of a preparation computes the symbolic Routh conditions; they depend on no value.
        analysis = analyzeAt(p, { values, settlingBand: q.settlingBand });
        conditions = analysis.conditions;
        for (const s of analysis.stableSets) sets.get(`${s.parameter}|${othersKey(at, s.parameter)}`, () => s);
      } else {
        const fast = analyzeAt(p, { values, settlingBand: q.settlingBand, stableSets: false });
        // A parameter's stable range depends on the other parameters only: moving its own slider reuses it.
        const den = ratDenominator(p.transfer);
        const stableSets = polyParams(den).map((name) => sets.get(`${name}|${othersKey(at, name)}`, () => stableSet(den, name, at)));
        analysis = { ...fast, stableSets, conditions };
      }
      const sweep = q.withSweep ? sweepOf(p, { wanted: q.sweepParameter, negative: q.negative ?? false }, at, analysis.plotHorizon, sweeps, notes) : null;
      const index = analysis.loop?.breakPoint.index;
      const wireId = index === undefined ? undefined : p.doc.wires[index]?.id;
      const breakWire: BreakWire | null = wireId && analysis.loop ? { id: wireId, chosen: analysis.loop.breakPoint.chosen } : null;
      const answer: AnalysisAnswer = { ok: true, analysis: { ...analysis, notes: [...notes, ...analysis.notes] }, parameters, sweep, breakWire };
      answered = { query: asked, answer };
      return answer;
    } catch (err) {
      if (!(err instanceof AnalysisError || err instanceof AlgebraError)) throw err;
      return { ok: false, problems: [...p.warnings, problemOf(err)], parameters: parameterInfo(p) };
    }
  };
}

/** The sweep of the chosen (else the first) parameter, others at the slider values; null without parameters. */
function sweepOf(p: PreparedAnalysis, { wanted, negative }: { wanted: string | null; negative: boolean }, at: Record<string, number>, tEnd: number, cache: Cache<Omit<SweepData, "current">>, notes: string[]): SweepData | null {
  const parameter = wanted !== null && p.parameters.includes(wanted) ? wanted : p.parameters[0];
  if (parameter === undefined) return null;
  try {
    const made = cache.get(`${parameter}|${negative}|${othersKey(at, parameter)}`, () => {
      const range = parameterRange(p.doc, parameter);
      const whole = wholeLocus(p, parameter, range, { n: LOCUS_POINTS, base: at, negative });
      // stepOverlay holds the other parameters at `nominal`: hand it the slider values in that place.
      const overlay = stepOverlay({ ...p, nominal: at }, parameter, sweepValues(range, OVERLAY_VALUES), tEnd);
      return { parameter, range, locus: whole.positive, negativeLocus: whole.negative, geometry: whole.geometry, locusNote: whole.note, overlay };
    });
    return { ...made, current: at[parameter] };
  } catch (err) {
    if (!(err instanceof AnalysisError || err instanceof AlgebraError)) throw err;
    notes.push(`The sweep of ${parameter} could not be computed: ${err.message}`);
    return null;
  }
}

export type AnalyzeOutcome =
  | { ok: true; doc: ExactReduction["diagram"]["doc"]; analysis: Analysis; result: AnalysisResult }
  | { ok: false; problems: Problem[] };

/**
 * Untrusted input to the published analysis of one pair (parse, reduce that pair, analyse, summarise): the
 * CLI's call. Never throws for bad input: every failure is a Problem with a code ("unknown-break-wire",
 * "degree-limit", the reducer's codes…). Example: analyzeDocument(json, { break: "w6" }).result.margins.
 */
export function analyzeDocument(
  raw: unknown,
  opts: { input?: string; output?: string; break?: string; values?: Record<string, number>; settlingBand?: number; padeOrder?: number } = {},
): AnalyzeOutcome {
  const reduced = reduceDocumentExact(raw, { input: opts.input, output: opts.output });
  if (!reduced.ok) return reduced;
  const { reduction } = reduced;
  const answer = createAnalyzer()(reduction, {
    input: opts.input ?? null,
    output: opts.output ?? null,
    break: opts.break ?? null,
    values: opts.values ?? {},
    settlingBand: opts.settlingBand ?? 0.02,
    sweepParameter: null,
    withSweep: false,
    padeOrder: opts.padeOrder,
  });
  if (!answer.ok) return { ok: false, problems: answer.problems };
  return { ok: true, doc: reduction.diagram.doc, analysis: answer.analysis, result: analysisSummary(answer.analysis, reduction.warnings) };
}
