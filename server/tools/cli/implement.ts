import { DISCRETISATION_METHODS, type DiscretisationMethod, type DiscretiseOptions } from "@shared/implement/discretise";
import { CHOICE_CODES, ImplementError } from "@shared/implement/errors";
import { REALISATION_FORMS, type RealisationForm } from "@shared/implement/realise";
import type { ImplementSelection } from "@shared/implement/selection";
import { counted, plural } from "@shared/text/words";
import { parseReduceArgs } from "@server/tools/cli/args";
import { CliExit, readJsonFile, runCommand, takeOption as cliTakeOption, usageError as cliUsageError } from "@server/tools/cli/command";
import { formatImplementation } from "@server/tools/cli/implementReport";
import { formatProblem } from "@server/tools/cli/report";

/**
 * `implement FILE.json [--json] (--block ID | --input ID --output ID) [--ts T --method M [--prewarp W]] [--form F]`
 * — public contract, called from teams' CI. Exit 0 success, 1 bad file content, 2 bad command line, 3 internal error.
 */
const USAGE =
  "usage: implement FILE.json [--json] (--block ID | --input ID --output ID) [--ts T --method tustin|prewarp|zoh|matched [--prewarp W]] [--form controllable|observable|minimal]   (implement --help for details)";

const HELP = `implement — discrete equivalent and state-space realisation of a block or of a pair's closed loop

${USAGE}

  FILE.json     a Loopwright diagram document (format "loopwright-diagram", version 1)
  --json        print one JSON object (shared/schemas/implement-result.schema.json):
                { continuous: { numerator, denominator }, discrete: { ts, method, numerator, denominator } | null,
                  stateSpace: { form, A, B, C, D } }, coefficients in descending powers of s or z (z^0 last)
  --block ID    a block's own transfer (gain, transfer function, integrator)
  --input ID --output ID
                the closed-loop transfer of that input → output pair
  --ts T        sample time in seconds (> 0), with --method:
  --method M    tustin   bilinear s = (2/T)(z - 1)/(z + 1)
                prewarp  bilinear pre-warped at --prewarp W rad/s (0 < W < pi/T): s = (W/tan(W T/2))(z - 1)/(z + 1)
                zoh      zero-order hold (step invariant)
                matched  matched pole-zero: z = e^(sT) for poles and zeros, zeros at infinity to z = -1,
                         gain matched at low frequency
  --form F      controllable (default) | observable canonical form | minimal (balanced when the system is
                stable, else the controllable form of the transfer in lowest terms)
  -h, --help    this text

Parameters take their nominal values. Dead-time blocks are refused where they enter the transfer (no finite-order
realisation); improper transfers (more zeros than poles) cannot be realised in state space. A warning on stderr
says when Ts is too large for the closed-loop bandwidth (common practice: sample at 10-30 times the bandwidth).
These results describe the linear model as drawn; validate on the plant and follow your functional-safety process.

Exit status:
  0  done; the result is on stdout (warnings on stderr)
  1  the file's content is wrong (not JSON, not a valid or reducible diagram), or the transfer holds a dead time,
     is improper or is singular at the nominal values; the problems are on stderr
  2  the command line is wrong: unknown option, missing or unreadable file, unknown or transfer-less --block,
     unknown --input/--output, bad --ts, --method, --prewarp or --form
  3  internal error (please report it with the diagram file)
`;

const usageError = (message: string) => cliUsageError("implement", USAGE, message);
const takeOption = (argv: readonly string[], name: string, hint: string) => cliTakeOption(argv, name, hint, usageError);

function oneOf<T extends string>(name: string, text: string | undefined, allowed: readonly T[]): T | undefined {
  if (text === undefined || (allowed as readonly string[]).includes(text)) return text as T | undefined;
  throw usageError(`--${name} must be one of ${allowed.join(", ")}, not "${text}"`);
}

function positive(name: string, text: string | undefined): number | undefined {
  if (text === undefined) return undefined;
  const x = Number(text);
  if (!Number.isFinite(x) || x <= 0 || text.trim() === "") throw usageError(`--${name} must be a positive number, not "${text}"`);
  return x;
}

/** --ts, --method and --prewarp together, or none of them. */
function discretisation(ts: number | undefined, method: DiscretisationMethod | undefined, prewarp: number | undefined): DiscretiseOptions | undefined {
  if (ts === undefined && method === undefined && prewarp === undefined) return undefined;
  if (ts === undefined) throw usageError("--method needs a sample time --ts T (seconds)");
  if (method === undefined) throw usageError(`--ts needs a --method: ${DISCRETISATION_METHODS.join(", ")}`);
  if (method === "prewarp" && prewarp === undefined) throw usageError("--method prewarp needs --prewarp W, the frequency in rad/s where the responses agree");
  if (method !== "prewarp" && prewarp !== undefined) throw usageError("--prewarp goes with --method prewarp");
  return { ts, method, prewarp };
}

interface Command {
  file: string;
  json: boolean;
  selection: ImplementSelection;
  discretise?: DiscretiseOptions;
  form: RealisationForm;
}

function parse(argv: readonly string[]): Command | "help" {
  const block = takeOption(argv, "block", "a block id, e.g. --block c");
  const ts = takeOption(block.rest, "ts", "a sample time in seconds, e.g. --ts 0.01");
  const method = takeOption(ts.rest, "method", `one of ${DISCRETISATION_METHODS.join(", ")}`);
  const prewarp = takeOption(method.rest, "prewarp", "a frequency in rad/s, e.g. --prewarp 10");
  const form = takeOption(prewarp.rest, "form", `one of ${REALISATION_FORMS.join(", ")}`);
  const parsed = parseReduceArgs(form.rest);
  if (parsed.kind === "help") return "help";
  if (parsed.kind === "usage-error") throw usageError(parsed.message);
  const { file, json, input, output } = parsed.args;
  const d = discretisation(positive("ts", ts.value), oneOf("method", method.value, DISCRETISATION_METHODS), positive("prewarp", prewarp.value));
  const chosenForm = oneOf("form", form.value, REALISATION_FORMS) ?? "controllable";
  if (block.value !== undefined && (input !== undefined || output !== undefined)) throw usageError("choose either --block ID or --input ID --output ID, not both");
  if (block.value !== undefined) return { file, json, selection: { block: block.value }, discretise: d, form: chosenForm };
  if (input === undefined || output === undefined) throw usageError("choose what to implement: --block ID, or --input ID and --output ID");
  return { file, json, selection: { input, output }, discretise: d, form: chosenForm };
}

async function run(argv: readonly string[]): Promise<string> {
  const command = parse(argv);
  if (command === "help") return HELP;
  const { file, json, selection } = command;
  const raw = readJsonFile("implement", USAGE, file);
  // Loaded only now: --help and command-line mistakes answer without loading the algebra.
  const { reduceDocumentExact } = await import("@shared/reduce/reduceDiagram");
  const { implement } = await import("@shared/implement/implement");
  const { loopBandwidth } = await import("@shared/implement/loopBandwidth");
  const { samplingAdvice } = await import("@shared/implement/sampling");
  const reduced = reduceDocumentExact(raw, "block" in selection ? {} : selection);
  if (!reduced.ok) {
    const pairProblems = reduced.problems.filter((p) => p.code === "unknown-pair-id");
    if (pairProblems.length) throw new CliExit(2, [...pairProblems.map((p) => `implement: ${p.message}`), USAGE]);
    const errors = reduced.problems.filter((p) => p.severity === "error").length;
    throw new CliExit(1, [`implement: ${file}: ${counted(errors, "problem")} ${plural(errors, "prevents", "prevent")} implementation`, ...reduced.problems.map(formatProblem)]);
  }
  try {
    const done = implement(reduced.reduction, selection, { discretise: command.discretise, form: command.form });
    const warnings = [...(done.realisation.note ? [done.realisation.note] : [])];
    if (command.discretise) {
      const loop = loopBandwidth(reduced.reduction, selection);
      const advice = loop && samplingAdvice(command.discretise.ts, loop.bandwidth, loop.loop);
      if (advice?.warning) warnings.push(advice.warning);
    }
    for (const w of warnings) process.stderr.write(`implement: warning: ${w}\n`);
    return json ? `${JSON.stringify(done.result, null, 2)}\n` : formatImplementation(done, command.discretise, reduced.reduction.diagram.doc.title);
  } catch (err) {
    if (!(err instanceof ImplementError)) throw err;
    const where = err.subject ? ` (${err.subject})` : "";
    if (CHOICE_CODES.has(err.code)) throw new CliExit(2, [`implement: ${err.message}`, USAGE]);
    throw new CliExit(1, [`implement: ${file}: error [${err.code}]${where}: ${err.message}`]);
  }
}

await runCommand("implement", run);
