import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { analysisResultSchema } from "@shared/analysis/schema";
import { unityFeedback } from "../support/docBuilder";
import { runCli, tempFiles, SPAWN_TIMEOUT, STACK_TRACE } from "../support/cliRun";

// The `analyze` command as teams' CI calls it: a real process (node + tsx), stdout, stderr and exit status.
const analyze = (...args: string[]) => runCli("analyze", ...args);
const { dir, file } = tempFiles("loopwright-analyze-");

// Unity negative feedback around 2/(s+1)^3: closed forms for the margins (see the margins tests).
const loop = unityFeedback("K/(s + 1)^3", { K: 2 }, "Third-order loop");

describe("analyze CLI", { timeout: SPAWN_TIMEOUT }, () => {
  it("--json prints the documented shape: poles, stable, dcGain, step, margins (GM = 20·log10 4 at √3, common practice), routh, steadyState, nyquist", async () => {
    const run = await analyze(file("loop.json", loop), "--json");
    expect(run.stderr).toBe("");
    expect(run.code).toBe(0);
    const r = analysisResultSchema.parse(JSON.parse(run.stdout));
    expect(r.stable).toBe("stable");
    expect(r.poles).toHaveLength(3);
    expect(r.dcGain).toBeCloseTo(2 / 3, 14);
    expect(r.margins.gainMarginDb).toBeCloseTo(20 * Math.log10(4), 10);
    expect(r.margins.phaseCrossover).toBeCloseTo(Math.sqrt(3), 10);
    expect(r.step.finalValue).toBeCloseTo(2 / 3, 14);
    expect(r.routh.stableSets[0].text).toBe("-1 < K < 8");
    expect(r.steadyState.constants?.Kp.exact).toBe("2");
    expect(r.nyquist).toMatchObject({ encirclements: 0, openLoopRhpPoles: 0, verdict: "stable" });
    expect(r.break).toMatchObject({ wire: "w5", index: 4, chosen: "default" });
  });

  it("--break by index, a readable report without --json, and the caution in --help", async () => {
    const run = await analyze(file("loop2.json", loop), "--break", "1");
    expect(run.code).toBe(0);
    expect(run.stdout).toContain("Break at w2");
    expect(run.stdout).toContain("Stability: stable");
    const help = await analyze("--help");
    expect(help.code).toBe(0);
    expect(help.stdout).toMatch(/validate on the plant/i);
    for (const code of ["0", "1", "2", "3"]) expect(help.stdout).toMatch(new RegExp(`^\\s+${code}\\s+\\S`, "m"));
  });

  it("exit 2: unknown --break (named), unknown option, unknown --input, missing file", async () => {
    const path = file("loop3.json", loop);
    const cases = [["--break", "nope"], ["--frobnicate"], ["--input", "zz"], []];
    for (const extra of cases) {
      const run = await analyze(...(extra.length ? [path, ...extra] : [join(dir, "missing.json")]));
      expect(run.code, extra.join(" ")).toBe(2);
      expect(run.stderr).toMatch(/usage: analyze/);
      expect(run.stderr).not.toMatch(STACK_TRACE);
    }
    expect((await analyze(path, "--break", "nope")).stderr).toContain('no wire "nope"');
  });

  it("exit 1: not JSON (line and column) and an invalid diagram naming the block", async () => {
    const bad = await analyze(file("bad.json", "{\n  \"format\": }"));
    expect(bad.code).toBe(1);
    expect(bad.stderr).toMatch(/line 2, column 13/);
    const invalid = await analyze(file("invalid.json", { ...loop, blocks: loop.blocks.map((b) => (b.id === "g" ? { ...b, expr: "K/(s + q)" } : b)) }));
    expect(invalid.code).toBe(1);
    expect(invalid.stderr).toMatch(/block g/);
  });
});
