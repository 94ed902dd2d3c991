import { existsSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import type { DiagramDocument } from "@shared/diagram/schema";
import { runChild } from "./childRun";

/**
 * The one way benchmarks run the PARI/GP reference (tests/reference/pari_reduce.gp, Debian's pari-gp): the document
 * written as GP data (exact numbers, parameters renamed so no name clashes with a GP function), then `gp` on that
 * file and the script, JSON on stdout, a time limit. A missing gp is an error naming the Debian package.
 */
export const GP = "/usr/bin/gp";
export const PARI_SCRIPT = fileURLToPath(new URL("../reference/pari_reduce.gp", import.meta.url));

export class PariTimeout extends Error {}

export interface PariOptions {
  input: string;
  output: string;
  /** Timed batches of solves inside GP, each of at least 20 ms (0: one solve, printed: a whole-process run). */
  repeat: number;
  /** Our printed result, compared exactly with the reference's. */
  ours?: { numerator: string; denominator: string; characteristic: string };
  timeoutMs?: number;
}

export interface PariAnswer {
  /** Wall time of one solve inside GP in the best batch (the gains, the graph, the order chosen in GP, the transfer). */
  solveMs?: number;
  runs?: number;
  /** Degree in s of the transfer's denominator. */
  degree?: number;
  /** With `ours`: wall time of χ from the solve's pivots, and the comparisons. */
  chiMs?: number;
  agrees?: boolean;
  lowestTerms?: boolean;
  chiAgrees?: boolean;
  /** The transfer as GP prints it: whole-process runs only. */
  numerator?: string;
  denominator?: string;
  /** Wall time of the whole gp process: start-up, reading the document, the solve, the output. */
  processMs: number;
}

/** Null when gp can run here, else why not (the note a benchmark prints instead of the column). */
export function pariMissing(): string | null {
  return existsSync(GP) ? null : `${GP} not found: install Debian's pari-gp (apt-get install -y pari-gp)`;
}

const NUMBER = /(\d+\.?\d*|\.\d+)(?:[eE]([+-]?\d+))?/y;
const NAME = /[A-Za-z_]\w*/y;

/** Diagram-syntax text (explicit products) as GP text: decimals as exact fractions, parameters as p_<name>. */
export function gpText(text: string): string {
  let out = "";
  for (let i = 0; i < text.length; ) {
    NUMBER.lastIndex = NAME.lastIndex = i;
    const num = /\d|\./.test(text[i]) ? NUMBER.exec(text) : null;
    const name = num ? null : NAME.exec(text);
    if (num) {
      const [whole, digits, exp] = num;
      const [int, frac = ""] = digits.split(".");
      const e = Number(exp ?? 0) - frac.length;
      const mantissa = `${BigInt(`${int || "0"}${frac}`)}`;
      out += e >= 0 ? `${mantissa}${"0".repeat(e)}` : `(${mantissa}/1${"0".repeat(-e)})`;
      i += whole.length;
    } else if (name) {
      out += name[0] === "s" ? "s" : `p_${name[0]}`;
      i += name[0].length;
    } else out += text[i++];
  }
  return out;
}

const gpString = (text: string) => `"${text.replace(/\\/g, "\\\\").replace(/"/g, '\\"')}"`;

/** The document as the GP data the script reads. */
function gpInput(doc: DiagramDocument, opts: PariOptions): string {
  const blocks = doc.blocks.map((b) => {
    const expr = "expr" in b && typeof b.expr === "string" ? gpText(b.expr) : "";
    const signs = "signs" in b && Array.isArray(b.signs) ? b.signs : [];
    return `[${gpString(b.id)}, ${gpString(b.type)}, ${gpString(expr)}, [${signs.map(gpString).join(", ")}]]`;
  });
  const wires = doc.wires.map((w) => `[${gpString(w.from)}, ${gpString(w.to)}, ${w.port ?? 0}]`);
  const ours = opts.ours ? `[${[opts.ours.numerator, opts.ours.denominator, opts.ours.characteristic].map((t) => gpString(gpText(t))).join(", ")}]` : "0";
  return [
    `BLOCKS = [${blocks.join(", ")}];`, // GP reads a statement per line
    `WIRES = [${wires.join(", ")}];`,
    `PAIR = [${gpString(opts.input)}, ${gpString(opts.output)}];`,
    `OURS = ${ours};`,
    `REPEAT = ${opts.repeat};`,
    "",
  ].join("\n");
}

/** Runs the reference on one pair of a document; rejects with PariTimeout past the time limit. */
export function runPari(doc: DiagramDocument, opts: PariOptions): Promise<PariAnswer> {
  const missing = pariMissing();
  if (missing) return Promise.reject(new Error(missing));
  const dir = mkdtempSync(join(tmpdir(), "loopwright-pari-"));
  const data = join(dir, "diagram.gp");
  writeFileSync(data, gpInput(doc, opts));
  const limit = opts.timeoutMs ?? 120_000;
  // -q: no banner; -f: no gprc; parisizemax: the stack may grow to 2 GB (not stop at 8 MB), debugmem=0: silently.
  const args = ["-q", "-f", "-D", "parisizemax=2G", "-D", "debugmem=0", data, PARI_SCRIPT];
  const timeout = () => new PariTimeout(`${PARI_SCRIPT} exceeded ${limit} ms`);
  return runChild(GP, args, { timeoutMs: limit, timeout })
    .then(({ code, stdout, stderr, ms }) => {
      const line = stdout.trim().split("\n").pop() ?? "";
      if (code !== 0 || !line.startsWith("{")) throw new Error(`gp failed (exit ${code}): ${(stderr || stdout).trim().slice(-400)}`);
      return { ...(JSON.parse(line) as Omit<PariAnswer, "processMs">), processMs: ms };
    })
    .finally(() => rmSync(dir, { recursive: true, force: true }));
}
