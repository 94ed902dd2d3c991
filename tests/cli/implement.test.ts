import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { implementResultSchema, type ImplementResult } from "@shared/implement/schema";
import { delayedLoop, piLoop, unityFeedback } from "../support/docBuilder";
import { runCli, tempFiles, SPAWN_TIMEOUT, STACK_TRACE } from "../support/cliRun";
import { floatCase, relativeDifference, runScipyImplement, type ScipyAnswer } from "../shared/implement/scipyReference";

// The `implement` command as teams' CI calls it: a real process (node + tsx), stdout, stderr and exit status.
// Numbers are checked against Debian's python3-scipy 1.10 (cont2discrete, bilinear, tf2ss, ss2tf) through
// tests/reference/scipy_implement.py, and against textbook pairs written `from memory:`.
const implement = (...args: string[]) => runCli("implement", ...args);
const { dir, file } = tempFiles("loopwright-implement-");

// The felt-conveyor demo's loop: PI controller Kp(Ti s + 1)/(Ti s) around a first-order drive, unity feedback.
const beltLoop = piLoop("8/(0.25*s + 1)", { Kp: 2, Ti: 0.4 }, "Belt speed loop");

const json = (stdout: string): ImplementResult => implementResultSchema.strict().parse(JSON.parse(stdout));
const close = (got: number[], want: number[], tol: number) => expect(relativeDifference(got, want), `${got} vs ${want}`).toBeLessThan(tol);

describe("implement CLI", { timeout: SPAWN_TIMEOUT }, () => {
  const belt = file("belt.json", beltLoop);
  let block: ImplementResult;
  let pair: ImplementResult;
  let pairWarning: string;
  let ref: ScipyAnswer[];

  beforeAll(async () => {
    const [b, p] = await Promise.all([
      implement(belt, "--json", "--block", "pi", "--ts", "0.01", "--method", "tustin"),
      implement(belt, "--json", "--input", "r", "--output", "y", "--ts=0.002", "--method=zoh", "--form", "minimal"),
    ]);
    expect([b.code, b.stderr]).toEqual([0, ""]);
    expect(p.code).toBe(0);
    block = json(b.stdout);
    pair = json(p.stdout);
    pairWarning = p.stderr;
    const { A, B, C, D } = pair.stateSpace;
    ref = (
      await runScipyImplement([
        floatCase("pi", block.continuous.numerator, block.continuous.denominator, 0.01),
        floatCase("pair", pair.continuous.numerator, pair.continuous.denominator, 0.002, undefined, { minimal: { A, B, C, D } }),
      ])
    ).results;
  }, 180_000);

  it("--json prints exactly { continuous, discrete, stateSpace }, coefficients descending, numbers as JSON numbers", () => {
    // Kp(Ti s + 1)/(Ti s) at Kp = 2, Ti = 0.4 is (2s + 5)/s; Tustin at 0.01 s (from memory: s → 200(z − 1)/(z + 1))
    // gives (2.025z − 1.975)/(z − 1).
    expect(Object.keys(block)).toEqual(["continuous", "discrete", "stateSpace"]);
    expect(block.continuous).toEqual({ numerator: [2, 5], denominator: [1, 0] });
    expect(block.discrete).toEqual({ ts: 0.01, method: "tustin", numerator: [2.025, -1.975], denominator: [1, -1] });
    expect(block.stateSpace).toEqual({ form: "controllable", A: [[0]], B: [[1]], C: [[5]], D: [[2]] });
  });

  it("agrees with scipy: Tustin with cont2discrete('bilinear'), the realisation with tf2ss", () => {
    const [pi] = ref;
    if (!block.discrete || !pi.tf2ss) throw new Error("missing");
    close(block.discrete.numerator, pi.tustin.num, 1e-14);
    close(block.discrete.denominator, pi.tustin.den, 1e-14);
    for (const key of ["A", "B", "C", "D"] as const) close(block.stateSpace[key].flat(), pi.tf2ss[key].flat(), 1e-14);
  });

  it("a pair's closed loop: ZOH as cont2discrete('zoh'), the balanced realisation's ss2tf is the closed loop", () => {
    // T = (2s + 5)·8/(s(0.25s + 1) + 8(2s + 5)) = (64s + 160)/(s² + 68s + 160) (from memory: unity feedback L/(1 + L)).
    expect(pair.continuous).toEqual({ numerator: [64, 160], denominator: [1, 68, 160] });
    const p = ref[1];
    if (!pair.discrete || !p.zoh) throw new Error("missing");
    expect(pair.discrete.method).toBe("zoh");
    close(pair.discrete.numerator, p.zoh.num, 1e-10);
    close(pair.discrete.denominator, p.zoh.den, 1e-10);
    expect(pair.stateSpace.form).toBe("minimal");
    close(p.ss2tf.minimal.num, pair.continuous.numerator, 1e-10);
    close(p.ss2tf.minimal.den, pair.continuous.denominator, 1e-10);
    // ωs = 2π/0.002 ≈ 3142 rad/s against ωB ≈ 62 rad/s: over 10×, no warning.
    expect(pairWarning).toBe("");
  });

  it("pre-warped Tustin and matched pole-zero of a block, and the Ts warning against the loop's bandwidth", async () => {
    const loop = file("lag.json", unityFeedback("a/(s + a)", { a: 2 }, "Lag loop"));
    const [pw, mz] = await Promise.all([
      implement(loop, "--json", "--block", "g", "--ts", "0.1", "--method", "prewarp", "--prewarp", "3"),
      implement(loop, "--json", "--block", "g", "--ts", "1", "--method", "matched"),
    ]);
    expect(pw.code).toBe(0);
    const c = 3 / Math.tan(0.15);
    // from memory: s = c(z − 1)/(z + 1) in 2/(s + 2) gives 2(z + 1)/((c + 2)z − (c − 2)).
    const got = json(pw.stdout).discrete;
    close(got?.numerator ?? [], [2 / (c + 2), 2 / (c + 2)], 1e-15);
    close(got?.denominator ?? [], [1, -(c - 2) / (c + 2)], 1e-15);
    expect(mz.code).toBe(0);
    const e = Math.exp(-2);
    // from memory: matched pole-zero of a/(s + a) is (1 − e^(−aT))/2·(z + 1)/(z − e^(−aT)).
    close(json(mz.stdout).discrete?.numerator ?? [], [(1 - e) / 2, (1 - e) / 2], 1e-15);
    // The closed loop 2/(s + 4) has ωB = 4 rad/s; Ts = 1 s samples at 2π rad/s, 1.6 times it.
    expect(mz.stderr).toMatch(/^implement: warning: Ts = 1 s is too large .* only 1\.571 times the closed-loop bandwidth 4 rad\/s of r → y/m);
  });

  it("without --json: a readable report with H(z) coefficients, the difference equation and C code", async () => {
    const run = await implement(belt, "--block", "pi", "--ts", "0.01", "--method", "tustin", "--form", "observable");
    expect(run.code).toBe(0);
    expect(run.stdout).toContain('transfer function "pi":  G(s) = (2*s + 5)/(s)');
    expect(run.stdout).toContain("y[k] = 2.0249999999999999*u[k] - 1.9750000000000001*u[k-1] + 1.0000000000000000*y[k-1]");
    expect(run.stdout).toContain("double pi_step(double u)");
    expect(run.stdout).toContain("State space, observable form");
    const help = await implement("--help");
    expect(help.code).toBe(0);
    for (const code of ["0", "1", "2", "3"]) expect(help.stdout).toMatch(new RegExp(`^\\s+${code}\\s+\\S`, "m"));
  });

  it("exit 2: the command line is wrong, each said with the usage line", async () => {
    const cases: [string[], RegExp][] = [
      [[], /choose what to implement/],
      [["--block", "pi", "--input", "r"], /either --block ID or --input ID --output ID/],
      [["--input", "r"], /choose what to implement/],
      [["--block", "nope"], /no block "nope"/],
      [["--block", "e"], /summing junction "e" has no transfer/],
      [["--input", "zz", "--output", "y"], /input "zz"/],
      [["--block", "pi", "--ts", "0.01"], /--ts needs a --method/],
      [["--block", "pi", "--ts", "-1", "--method", "zoh"], /--ts must be a positive number, not "-1"/],
      [["--block", "pi", "--ts", "0.01", "--method", "euler"], /--method must be one of tustin, prewarp, zoh, matched, not "euler"/],
      [["--block", "pi", "--ts", "0.01", "--method", "prewarp"], /--method prewarp needs --prewarp W/],
      [["--block", "pi", "--ts", "0.01", "--method", "prewarp", "--prewarp", "400"], /0 < ω < π\/Ts = 314\.159 rad\/s, not 400/],
      [["--block", "pi", "--form", "jordan"], /--form must be one of controllable, observable, minimal/],
      [["--block", "pi", "--frobnicate"], /unknown option "--frobnicate"/],
    ];
    const runs = await Promise.all(cases.map(([args]) => implement(belt, ...args)));
    runs.forEach((run, i) => {
      expect(run.code, cases[i][0].join(" ")).toBe(2);
      expect(run.stderr).toMatch(cases[i][1]);
      expect(run.stderr).toMatch(/usage: implement/);
      expect(run.stderr).not.toMatch(STACK_TRACE);
    });
    expect((await implement(join(dir, "missing.json"), "--block", "pi")).code).toBe(2);
  });

  it("exit 1: a dead time in the transfer, an improper block and bad JSON, each named", async () => {
    const delayed = file("delay.json", delayedLoop("1", "0.5", "1/(s + 1)"));
    const [dead, deadBlock, improper, bad] = await Promise.all([
      implement(delayed, "--json", "--input", "r", "--output", "y"),
      implement(delayed, "--json", "--block", "d"),
      implement(file("pd.json", unityFeedback("2*(s + 1)")), "--json", "--block", "g", "--ts", "0.01", "--method", "tustin"),
      implement(file("bad.json", '{\n  "format": }'), "--block", "g"),
    ]);
    expect(dead.code).toBe(1);
    expect(dead.stderr).toMatch(/error \[dead-time\].*dead time e\^\(−sT\) of block d\b/);
    expect(deadBlock.code).toBe(1);
    expect(deadBlock.stderr).toMatch(/error \[dead-time\] \(d\): The transfer of dead time "d" holds the dead time e\^\(−sT\) of block d\b/);
    expect(improper.code).toBe(1);
    expect(improper.stderr).toMatch(/error \[improper\] \(g\): The transfer of transfer function "g" has more zeros \(1\) than poles \(0\)/);
    expect(bad.code).toBe(1);
    expect(bad.stderr).toMatch(/line 2, column 13/);
    for (const run of [dead, deadBlock, improper, bad]) {
      expect(run.stdout).toBe("");
      expect(run.stderr).not.toMatch(STACK_TRACE);
    }
  });
});
