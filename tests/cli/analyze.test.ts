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

  it("a dead time: --pade N sets the Padé model, while the exact-delay step metrics (simulated) do not depend on it", async () => {
    const delayed = {
      format: "loopwright-diagram", version: 1, parameters: {},
      blocks: [
        { id: "r", type: "input" }, { id: "e", type: "sum", signs: ["+", "-"] }, { id: "c", type: "gain", expr: "2" },
        { id: "d", type: "delay", expr: "0.5" }, { id: "G", type: "transfer", expr: "1/(s+1)" }, { id: "y", type: "output" },
      ],
      wires: [{ from: "r", to: "e", port: 0 }, { from: "e", to: "c" }, { from: "c", to: "d" }, { from: "d", to: "G" }, { from: "G", to: "y" }, { from: "G", to: "e", port: 1 }],
    };
    const path = file("delayed.json", delayed);
    const [low, high] = await Promise.all(["2", "8"].map(async (n) => analysisResultSchema.parse(JSON.parse((await analyze(path, "--json", "--pade", n)).stdout))));
    expect(low.deadTime?.padeOrder).toBe(2);
    expect(high.deadTime?.padeOrder).toBe(8);
    expect(low.step.overshootPercent).not.toBeCloseTo(high.step.overshootPercent ?? 0, 3);
    // The simulated horizon follows the Padé model's settling, so the grids differ slightly: agreement to 1e-5.
    for (const key of ["riseTime", "peakTime", "overshootPercent", "settlingTime"] as const) {
      const [a, b] = [high.deadTime?.exactStep?.[key] ?? Number.NaN, low.deadTime?.exactStep?.[key] ?? Number.NaN];
      expect(Math.abs(a - b)).toBeLessThan(1e-5 * Math.abs(b));
    }
    expect(low.deadTime?.exactStep?.method).toBe("simulation");
    // The Padé-8 model is close to the exact delay: its overshoot within 0.05 percentage points of the simulated one.
    expect(Math.abs((high.step.overshootPercent ?? 0) - (high.deadTime?.exactStep?.overshootPercent ?? 99))).toBeLessThan(0.05);
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
