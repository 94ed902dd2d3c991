import { DISCRETISATION_METHODS, type DiscretisationMethod, type DiscretiseOptions } from "@shared/implement/discretise";
import { REALISATION_FORMS, type RealisationForm } from "@shared/implement/realise";
import type { ImplementSelection } from "@shared/implement/selection";
import { parseReduceArgs } from "@server/tools/cli/args";
import { takeOption as cliTakeOption, usageError as cliUsageError } from "@server/tools/cli/command";

/**
 * Command line of `implement`: a block or a pair, an optional discretisation and a form. Usage mistakes are thrown
 * as CliExit(2) with the usage line. Example: parseImplementArgs(["d.json", "--block", "c"]).selection is { block: "c" }.
 */
export const IMPLEMENT_USAGE =
  "usage: implement FILE.json [--json] (--block ID | --input ID --output ID) [--ts T --method tustin|prewarp|zoh|matched [--prewarp W]] [--form controllable|observable|minimal]   (implement --help for details)";

const usageError = (message: string) => cliUsageError("implement", IMPLEMENT_USAGE, message);
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

export interface ImplementCommand {
  file: string;
  json: boolean;
  selection: ImplementSelection;
  discretise?: DiscretiseOptions;
  form: RealisationForm;
}

export function parseImplementArgs(argv: readonly string[]): ImplementCommand | "help" {
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

