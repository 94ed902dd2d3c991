import type { Problem } from "@shared/diagram/problems";
import { analyzeDocument } from "@shared/analysis/analyzeDiagram";
import { PADE_MAX, PADE_MIN } from "@shared/analysis/pade";
import type { AnalysisResult } from "@shared/analysis/schema";
import { counted, plural } from "@shared/text/words";
import { parseReduceArgs } from "@server/tools/cli/args";
import { CliExit, readJsonFile, runCommand, takeOption as cliTakeOption, usageError as cliUsageError } from "@server/tools/cli/command";
import { formatProblem } from "@server/tools/cli/report";

/**
 * `analyze FILE.json [--json] [--input ID] [--output ID] [--break WIRE] [--pade N]` — public contract, called from teams' CI.
 * Exit 0 success, 1 bad file content, 2 bad command line (unknown --break too), 3 internal error; never a stack trace.
 */
const USAGE = "usage: analyze FILE.json [--json] [--input ID] [--output ID] [--break WIRE] [--pade N]   (analyze --help for details)";

const HELP = `analyze — stability, Routh array, step response, margins and steady state of a Loopwright diagram

${USAGE}

  FILE.json     a Loopwright diagram document (format "loopwright-diagram", version 1)
  --json        print one JSON object (shared/schemas/analysis-result.schema.json): poles, zeros, stable,
                dcGain, step, margins, routh, steadyState, sensitivityPeak, delayMargin, nyquist, notes, …
  --input ID    the pair's input block (default: the first input block in the document)
  --output ID   the pair's output block (default: the first output block in the document)
  --break WIRE  the wire where the loop gain L = −w/u is taken for margins and the Nyquist plot: a wire id
                or its 0-based index in "wires" (default: the wire into the minus port of the first
                summing junction with a minus sign that the input reaches)
  --pade N      order (1–10, default 3) of the Padé approximant that stands for each dead-time block
                e^(-sT) in the poles, Routh array and time responses ("deadTime" in --json); margins,
                Ms, bandwidth and the Nyquist verdict use the exact e^(-jωT)
  -h, --help    this text

Parameters take their nominal values. A quantity that does not exist (no overshoot, an infinite margin,
an unstable system) is null, with the reason in "notes".
These results describe the linear model as drawn; dead times enter through their Padé approximant (see
--pade); actuator limits, saturation and other nonlinearity are not in it. Validate on the plant and follow your functional-safety process and local codes.

Exit status:
  0  analysed; the result is on stdout (warnings included)
  1  the file's content is wrong (not JSON, not a valid or reducible diagram, a polynomial above degree 100);
     the problems are on stderr
  2  the command line is wrong: unknown option, missing or unreadable file, unknown --input/--output id or
     --break wire
  3  internal error (please report it with the diagram file)
`;

const usageError = (message: string) => cliUsageError("analyze", USAGE, message);
const takeOption = (argv: readonly string[], name: string, hint: string) => cliTakeOption(argv, name, hint, usageError);

/** `--pade N`: an integer from 1 to 10. */
function padeOrderOf(text: string | undefined): number | undefined {
  if (text === undefined) return undefined;
  const n = Number(text);
  if (!Number.isInteger(n) || n < PADE_MIN || n > PADE_MAX) throw usageError(`--pade must be an integer from ${PADE_MIN} to ${PADE_MAX}, not "${text}"`);
  return n;
}

const USAGE_CODES = new Set(["unknown-pair-id", "unknown-break-wire"]);
const fmt = (x: number | null) => (x === null ? "none" : String(Number(x.toPrecision(6))));

/** The readable report (without --json). */
function report(r: AnalysisResult, title: string | undefined): string {
  const lines = [
    ...(title ? [title, ""] : []),
    `${r.input} → ${r.output}:  T(s) = (${r.transfer.numerator})/(${r.transfer.denominator})`,
    `Stability: ${r.stable} — ${r.stabilityReason}`,
    `Poles: ${r.poleDetails.map((p) => `${p.exact ?? `${fmt(p.re)}${p.im ? ` ${p.im < 0 ? "-" : "+"} ${fmt(Math.abs(p.im))}j` : ""}`}${p.multiplicity > 1 ? ` (×${p.multiplicity})` : ""}`).join(", ") || "none"}`,
    `Routh: first column ${r.routh.firstColumn.join(", ")} — ${r.routh.conclusion}`,
    ...r.routh.stableSets.map((s) => `Stable for ${s.text} (others nominal)`),
    `DC gain: ${fmt(r.dcGain)}`,
    `Step: rise ${fmt(r.step.riseTime)}, peak ${fmt(r.step.peakTime)}, overshoot ${fmt(r.step.overshootPercent)} %, settling ${fmt(r.step.settlingTime)}, final ${fmt(r.step.finalValue)}`,
    `y_step(t) = ${r.responses.step.formula}${r.responses.step.exact ? "" : "   (numeric, 12 significant digits)"}`,
    r.break
      ? `Break at ${r.break.wire}: L(s) = (${r.loopGain?.numerator})/(${r.loopGain?.denominator}); gain margin ${fmt(r.margins.gainMarginDb)} dB at ${fmt(r.margins.phaseCrossover)} rad/s, phase margin ${fmt(r.margins.phaseMarginDeg)}° at ${fmt(r.margins.gainCrossover)} rad/s, Ms ${fmt(r.sensitivityPeak)}, delay margin ${fmt(r.delayMargin)} s`
      : "No break point: margins not computed.",
    ...(r.nyquist ? [`Nyquist: ${r.nyquist.verdict} — ${r.nyquist.reason}`] : []),
    ...(r.notes.length ? ["", "Notes:", ...r.notes.map((n) => `  ${n}`)] : []),
    ...(r.warnings.length ? ["", "Warnings:", ...r.warnings.map((w) => `  ${formatProblem(w)}`)] : []),
  ];
  return `${lines.join("\n")}\n`;
}

function run(argv: readonly string[]): string {
  const brk = takeOption(argv, "break", "a wire id or index, e.g. --break w6");
  const pade = takeOption(brk.rest, "pade", `an order from ${PADE_MIN} to ${PADE_MAX}, e.g. --pade 5`);
  const padeOrder = padeOrderOf(pade.value);
  const parsed = parseReduceArgs(pade.rest);
  if (parsed.kind === "help") return HELP;
  if (parsed.kind === "usage-error") throw usageError(parsed.message);
  const { file, json, input, output } = parsed.args;
  const raw = readJsonFile("analyze", USAGE, file);
  const out = analyzeDocument(raw, { input, output, break: brk.value, padeOrder });
  if (!out.ok) {
    const usage = out.problems.filter((p: Problem) => USAGE_CODES.has(p.code));
    if (usage.length) throw new CliExit(2, [...usage.map((p) => `analyze: ${p.message}`), USAGE]);
    const errors = out.problems.filter((p) => p.severity === "error").length;
    throw new CliExit(1, [`analyze: ${file}: ${counted(errors, "problem")} ${plural(errors, "prevents", "prevent")} analysis`, ...out.problems.map(formatProblem)]);
  }
  return json ? `${JSON.stringify(out.result, null, 2)}\n` : report(out.result, out.doc.title);
}

await runCommand("analyze", run);
