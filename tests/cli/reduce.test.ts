import { mkdirSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { reductionResultSchema } from "@shared/reduce/result";
import { cClose, cx } from "../support/complex";
import { evalExpr } from "../support/evalExpr";
import { makeDoc } from "../support/docBuilder";
import { runCli, tempFiles, type CliRun, SPAWN_TIMEOUT, STACK_TRACE } from "../support/cliRun";
import { evalTransfer } from "../support/ours";
import { TEXTBOOK_CASES } from "../support/textbookDiagrams";

// The `reduce` command as teams' CI calls it: a real process (node + tsx), checking stdout, stderr and
// the exit status of each documented case.
const reduce = (...args: string[]) => runCli("reduce", ...args);
const { dir, file } = tempFiles("loopwright-cli-");
const USAGE = "usage: reduce FILE.json";

// The example document of the diagram format (spindle speed loop).
const spindle = makeDoc(
  [
    { id: "r", type: "input", label: "r" },
    { id: "e", type: "sum", signs: ["+", "-"] },
    { id: "c", type: "transfer", expr: "K*(s+2)/s" },
    { id: "p", type: "transfer", expr: "1/(tau*s^2 + s)" },
    { id: "h", type: "gain", expr: "0.5" },
    { id: "y", type: "output", label: "y" },
  ],
  ["r->e:0", "e->c", "c->p", "p->y", "p->h", "h->e:1"],
  { K: 4, tau: { value: 0.5, unit: "s", min: 0.1, max: 2, description: "motor time constant" } },
  "Spindle speed loop",
);

describe("reduce CLI: success", { timeout: SPAWN_TIMEOUT }, () => {
  it("--json prints one ReductionResult whose transfer is G/(1 + G·H) (from memory: Nise, Control Systems Engineering, canonical feedback form)", async () => {
    const run = await reduce(file("spindle.json", spindle), "--json");
    expect(run.stderr).toBe("");
    expect(run.code).toBe(0);
    const result = reductionResultSchema.parse(JSON.parse(run.stdout));
    expect(result.transfers).toHaveLength(1);
    const t = result.transfers[0];
    expect([t.input, t.output]).toEqual(["r", "y"]);
    const expected = "(K*(s+2)/s)*(1/(tau*s^2+s))/(1 + (K*(s+2)/s)*(1/(tau*s^2+s))*0.5)";
    for (const s of [cx(0.4, 1.3), cx(-2, 0.7)]) {
      const params = { K: 4, tau: 0.5 };
      expect(cClose(evalTransfer(t, s, params), evalExpr(expected, s, params), 1e-10)).toBe(true);
    }
    expect(result.steps.length).toBeGreaterThan(0);
    expect(result.warnings).toEqual([]);
  });

  it("without --json prints a readable report: the pair, the polynomials, the steps, the warnings", async () => {
    const run = await reduce(file("spindle-text.json", spindle));
    expect(run.code).toBe(0);
    expect(run.stderr).toBe("");
    expect(run.stdout).toContain("Spindle speed loop");
    expect(run.stdout).toContain("r → y:");
    expect(run.stdout).toMatch(/numerator: +\S/);
    expect(run.stdout).toMatch(/denominator: +\S/);
    expect(run.stdout).toMatch(/Reduction steps \(\d+\)/);
    expect(run.stdout).toMatch(/\d+\. (series|parallel|feedback|move-sum|move-pickoff|eliminate-node)/);
    expect(run.stdout).toContain("Warnings: none");
  });

  it("the report numbers each pair's steps from 1 and lists consumed blocks apart from wires", async () => {
    const tc = TEXTBOOK_CASES.find((c) => c.name.startsWith("reference and disturbance"))!;
    const run = await reduce(file("two-inputs-report.json", tc.doc));
    expect(run.code).toBe(0);
    const report = run.stdout.slice(run.stdout.indexOf("Reduction steps"));
    const pairs = report.split("\n").filter((l) => /^ {2}\S+ → \S+:$/.test(l));
    expect(pairs.length).toBeGreaterThan(1);
    for (const section of report.split(/\n {2}\S+ → \S+:\n/).slice(1)) {
      const numbers = [...section.matchAll(/^ {4}(\d+)\. /gm)].map((m) => Number(m[1]));
      expect(numbers).toEqual(numbers.map((_, k) => k + 1));
    }
    expect(report).toMatch(/consumed blocks: [^;]+; wires: /);
  });

  it("--input/--output keep only that pair and its steps (from memory: Nise, disturbance rejection T_d = G2/(1 + G1·G2))", async () => {
    const tc = TEXTBOOK_CASES.find((c) => c.name.startsWith("reference and disturbance"))!;
    const path = file("two-inputs.json", tc.doc);
    const all = reductionResultSchema.parse(JSON.parse((await reduce(path, "--json")).stdout));
    expect(all.transfers).toHaveLength(4);
    const run = await reduce(path, "--json", "--input", "d", "--output=y");
    expect(run.code).toBe(0);
    const one = reductionResultSchema.parse(JSON.parse(run.stdout));
    expect(one.transfers.map((t) => `${t.input}→${t.output}`)).toEqual(["d→y"]);
    for (const step of one.steps) expect([step.input, step.output]).toEqual(["d", "y"]);
    const s = cx(0.3, 0.9);
    expect(cClose(evalTransfer(one.transfers[0], s, { K: 4 }), evalExpr(tc.expected["d→y"], s, { K: 4 }), 1e-10)).toBe(true);
  });

  it("--timing adds timing: { reduceMs, totalMs } to the JSON, the reduction a part of the whole command; the result is unchanged", async () => {
    const path = file("spindle-timing.json", spindle);
    const plain = JSON.parse((await reduce(path, "--json")).stdout) as Record<string, unknown>;
    const run = await reduce(path, "--json", "--timing");
    expect(run.stderr).toBe("");
    expect(run.code).toBe(0);
    const { timing, ...rest } = JSON.parse(run.stdout) as { timing: Record<string, unknown> } & Record<string, unknown>;
    expect(rest).toEqual(plain);
    expect(Object.keys(timing).sort()).toEqual(["reduceMs", "totalMs"]);
    const { reduceMs, totalMs } = timing as { reduceMs: number; totalMs: number };
    for (const ms of [reduceMs, totalMs]) expect(Number.isFinite(ms) && ms > 0, String(ms)).toBe(true);
    expect(reduceMs).toBeLessThanOrEqual(totalMs);

    const text = await reduce(path, "--timing");
    expect(text.code).toBe(0);
    const line = /^Timing: reduction ([\d.]+) ms, whole command ([\d.]+) ms$/m.exec(text.stdout);
    expect(line, text.stdout.slice(-200)).not.toBeNull();
    expect(Number(line![1])).toBeLessThanOrEqual(Number(line![2]));
  });

  it("warnings do not fail the run: they are in the JSON (a block that reaches no output)", async () => {
    const doc = makeDoc(
      [
        { id: "r", type: "input" },
        { id: "g", type: "gain", expr: "2" },
        { id: "dead", type: "gain", expr: "3" },
        { id: "y", type: "output" },
      ],
      ["r->g", "g->y", "g->dead"],
    );
    const run = await reduce(file("warning.json", doc), "--json");
    expect(run.code).toBe(0);
    const result = reductionResultSchema.parse(JSON.parse(run.stdout));
    expect(result.warnings.some((w) => w.blockId === "dead")).toBe(true);
  });

  it("--help explains the usage and the exit statuses", async () => {
    const run = await reduce("--help");
    expect(run.code).toBe(0);
    expect(run.stdout).toContain(USAGE);
    for (const code of ["0", "1", "2"]) expect(run.stdout).toMatch(new RegExp(`^\\s+${code}\\s+\\S`, "m"));
  });
});

describe("reduce CLI: the file's content is wrong → exit 1, messages on stderr, no stack trace", { timeout: SPAWN_TIMEOUT }, () => {
  const expectContentError = (run: CliRun, ...fragments: string[]) => {
    expect(run.code).toBe(1);
    expect(run.stdout).toBe("");
    for (const f of fragments) expect(run.stderr).toContain(f);
    expect(run.stderr).not.toMatch(STACK_TRACE);
  };

  it("not JSON: line and column of the first error", async () => {
    const text = '{\n  "format": "loopwright-diagram",\n  "version": 1,\n  "blocks": [,]\n}\n';
    expectContentError(await reduce(file("broken.json", text)), "not valid JSON at line 4, column 14");
  });

  it("an empty file is not JSON either", async () => {
    expectContentError(await reduce(file("empty.json", "")), "line 1, column 1");
  });

  it("unsupported version", async () => {
    expectContentError(await reduce(file("v2.json", { ...spindle, version: 2 })), "version 2");
  });

  it("fails the schema: a sum without signs names the block", async () => {
    const doc = { ...spindle, blocks: spindle.blocks.map((b) => (b.id === "e" ? { id: "e", type: "sum" } : b)) };
    expectContentError(await reduce(file("schema.json", doc)), "block e");
  });

  it("invalid diagram: an unknown name in an expression names the block and points at it", async () => {
    const doc = { ...spindle, blocks: spindle.blocks.map((b) => (b.id === "c" ? { ...b, expr: "Kp*(s+2)/s" } : b)) };
    const run = await reduce(file("unknown-name.json", doc));
    expectContentError(run, "[unknown-name]", "block c", "field expr");
    expect(run.stderr).toContain("Kp*(s+2)/s\n    ^");
  });

  it("invalid diagram: every wiring problem is listed, each naming its block or wire", async () => {
    const doc = makeDoc(
      [
        { id: "r", type: "input" },
        { id: "e", type: "sum", signs: ["+", "-"] },
        { id: "y", type: "output" },
      ],
      ["r->e:0", "e->y", "ghost->e:1", "r->y"],
    );
    const run = await reduce(file("wiring.json", doc));
    expectContentError(run, "wire w3", "ghost", "block y");
  });

  it("ill-posed: positive unity feedback around a unity gain is an algebraic loop naming its blocks (common practice: 1 − 1 = 0)", async () => {
    const doc = makeDoc(
      [
        { id: "r", type: "input" },
        { id: "e", type: "sum", signs: ["+", "+"] },
        { id: "g", type: "gain", expr: "1" },
        { id: "y", type: "output" },
      ],
      ["r->e:0", "e->g", "g->y", "g->e:1"],
    );
    const run = await reduce(file("algebraic.json", doc));
    expectContentError(run, "[algebraic-loop]");
    expect(run.stderr).toMatch(/\bg\b/);
    expect(run.stderr).toMatch(/\be\b/);
  });

  it("over a limit: an expression longer than 2,000 characters", async () => {
    const long = Array.from({ length: 1100 }, () => "1").join("+"); // 2,199 characters
    const doc = { ...spindle, blocks: spindle.blocks.map((b) => (b.id === "h" ? { ...b, expr: long } : b)) };
    expectContentError(await reduce(file("long.json", doc)), "[expr-too-long]", "block h");
  });
});

describe("reduce CLI: the command line is wrong → exit 2 with a usage line", { timeout: SPAWN_TIMEOUT }, () => {
  const expectUsageError = (run: CliRun, fragment: string) => {
    expect(run.code).toBe(2);
    expect(run.stdout).toBe("");
    expect(run.stderr).toContain(fragment);
    expect(run.stderr).toContain(USAGE);
    expect(run.stderr).not.toMatch(STACK_TRACE);
  };

  it("unknown option", async () => {
    expectUsageError(await reduce(file("ok1.json", spindle), "--fast"), '"--fast"');
  });

  it("no file, or two files", async () => {
    expectUsageError(await reduce("--json"), "no diagram file");
    expectUsageError(await reduce("a.json", "b.json"), "one diagram file at a time");
  });

  it("missing file", async () => {
    expectUsageError(await reduce(join(dir, "nope.json")), "no such file");
  });

  it("unreadable file: a directory", async () => {
    const sub = join(dir, "folder.json");
    mkdirSync(sub, { recursive: true });
    expectUsageError(await reduce(sub), "directory");
  });

  it("--input without an id", async () => {
    expectUsageError(await reduce(file("ok2.json", spindle), "--input"), "--input needs a block id");
  });

  it("unknown --input / --output id", async () => {
    const path = file("ok3.json", spindle);
    expectUsageError(await reduce(path, "--input", "nope"), "nope");
    expectUsageError(await reduce(path, "--output", "h"), '"h"');
  });
});
