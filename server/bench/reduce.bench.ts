import { spawn } from "node:child_process";
import { cpus } from "node:os";
import { fileURLToPath } from "node:url";
import { reduceDocument } from "@shared/engine/reduceDocument";
import { benchDiagram, type BenchFamily } from "@server/bench/diagrams";
// The sympy reference lives with the tests (tests/reference); resolved through the tsconfig baseUrl.
import { sympyBench, SympyTimeout } from "tests/support/sympy";

/**
 * Reduction benchmark: generated ladders and nested-loop chains, our engine against sympy's exact
 * sparse linear solve of the same block equations. Prints figures and targets; asserts nothing.
 * Each case of ours runs in a child process (its own peak RSS, killable at the time limit).
 * Run: npx tsx server/bench/reduce.bench.ts
 */
const LIMIT_MS = 120_000;
const SELF = fileURLToPath(import.meta.url);

interface Case {
  family: BenchFamily;
  blocks: number;
  symbolic: boolean;
}

interface OursFigures {
  medianMs: number;
  runs: number;
  peakRssMB: number;
  startRssMB: number;
  degree: number;
  error?: string;
}

const CASES: Case[] = [
  ...(["ladder", "nested"] as const).flatMap((family) =>
    [20, 60, 150, 500].map((blocks) => ({ family, blocks, symbolic: false })),
  ),
  ...(["ladder", "nested"] as const).flatMap((family) => [10, 30].map((blocks) => ({ family, blocks, symbolic: true }))),
];

const caseName = (c: Case) => `${c.family}:${c.blocks}${c.symbolic ? ":sym" : ""}`;
const docOf = (c: Case) => benchDiagram(c.family, c.blocks, { symbolic: c.symbolic });

/** Degree in s of a polynomial written in the result syntax (bench display only). */
const degreeOf = (poly: string): number =>
  Math.max(/\bs\b/.test(poly) ? 1 : 0, ...[...poly.matchAll(/\bs\^(\d+)/g)].map((m) => Number(m[1])));

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/** Child-process side: time our reduction of one case and report figures as JSON on stdout. */
function measureCase(name: string): void {
  const [family, blocks, sym] = name.split(":");
  const doc = docOf({ family: family as BenchFamily, blocks: Number(blocks), symbolic: sym === "sym" });
  const startRssMB = process.memoryUsage().rss / 1048576;
  const runs = Number(blocks) >= 500 ? 3 : 7;
  const times: number[] = [];
  let degree = 0;
  let error: string | undefined;
  for (let i = 0; i <= runs; i++) {
    const t0 = performance.now();
    const out = reduceDocument(doc);
    const ms = performance.now() - t0;
    if (!out.ok) {
      error = out.problems.map((p) => p.code).join(", ");
      break;
    }
    degree = degreeOf(out.result.transfers[0].denominator);
    if (i > 0) times.push(ms); // the first run warms up the JIT
  }
  const peakRssMB = process.resourceUsage().maxRSS / 1024; // kB on Linux
  const figures: OursFigures = { medianMs: times.length ? median(times) : NaN, runs: times.length, peakRssMB, startRssMB, degree, error };
  process.stdout.write(JSON.stringify(figures));
}

function runOurs(c: Case): Promise<OursFigures | "timeout" | string> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, [...process.execArgv, SELF, "--case", caseName(c)], { stdio: ["ignore", "pipe", "pipe"] });
    let out = "";
    let err = "";
    const timer = setTimeout(() => child.kill("SIGKILL"), LIMIT_MS);
    child.stdout.on("data", (d: Buffer) => (out += d.toString()));
    child.stderr.on("data", (d: Buffer) => (err += d.toString()));
    child.on("close", (code, signal) => {
      clearTimeout(timer);
      if (signal) resolve("timeout");
      else if (code !== 0) resolve(`failed: ${err.trim().split("\n")[0]}`);
      else resolve(JSON.parse(out) as OursFigures);
    });
  });
}

async function runSympy(c: Case): Promise<{ seconds: number; degree: number } | "timeout" | string> {
  try {
    const r = await sympyBench(docOf(c), "r", "y", LIMIT_MS);
    return { seconds: r.seconds, degree: r.denominatorDegree };
  } catch (e) {
    return e instanceof SympyTimeout ? "timeout" : `failed: ${(e as Error).message}`;
  }
}

const pad = (s: string, n: number) => s.padStart(n);
const fmtMs = (ms: number) => (ms < 10 ? ms.toFixed(2) : ms < 100 ? ms.toFixed(1) : ms.toFixed(0));

/** Least-squares slope of log(time) against log(blocks). */
function powerLawExponent(points: { blocks: number; ms: number }[]): number {
  const xs = points.map((p) => Math.log(p.blocks));
  const ys = points.map((p) => Math.log(p.ms));
  const mx = xs.reduce((a, b) => a + b, 0) / xs.length;
  const my = ys.reduce((a, b) => a + b, 0) / ys.length;
  const sxy = xs.reduce((a, x, i) => a + (x - mx) * (ys[i] - my), 0);
  const sxx = xs.reduce((a, x) => a + (x - mx) ** 2, 0);
  return sxy / sxx;
}

async function main(): Promise<void> {
  console.log(`Reduction benchmark — node ${process.version}, ${cpus().length} cores, per-case limit ${LIMIT_MS / 1000} s`);
  console.log("ours: median of warm runs of reduceDocument (parse, validate, reduce, every output string);");
  console.log("sympy: exact sparse Gauss-Jordan of the block equations over QQ(s, params), python start-up excluded\n");
  const header = ["case", "blocks", "deg", "ours ms", "runs", "RSS start MB", "peak MB", "sympy s", "deg", "sympy/ours"];
  const widths = [18, 6, 5, 9, 5, 13, 8, 9, 5, 11];
  console.log(header.map((h, i) => pad(h, widths[i])).join(" "));
  const rows: { c: Case; ours: OursFigures | null; sympyS: number | null }[] = [];
  for (const c of CASES) {
    const ours = await runOurs(c);
    const sym = await runSympy(c);
    const o = typeof ours === "object" && !ours.error ? ours : null;
    const s = typeof sym === "object" ? sym : null;
    const oursCell = ours === "timeout" ? "> limit" : o ? fmtMs(o.medianMs) : "error";
    const sympyCell = sym === "timeout" ? "> limit" : s ? s.seconds.toFixed(3) : "error";
    const ratio = o && s ? `${(s.seconds * 1000 / o.medianMs).toFixed(1)}×` : "-";
    const cells = [
      `${c.family}${c.symbolic ? " (K,a,tau)" : ""}`, String(c.blocks), o ? String(o.degree) : "-", oursCell,
      o ? String(o.runs) : "-", o ? o.startRssMB.toFixed(0) : "-", o ? o.peakRssMB.toFixed(0) : "-",
      sympyCell, s ? String(s.degree) : "-", ratio,
    ];
    console.log(cells.map((v, i) => pad(v, widths[i])).join(" "));
    if (typeof ours === "string") console.log(`    ours: ${ours}`);
    else if (ours.error) console.log(`    ours refused the diagram: ${ours.error}`);
    if (typeof sym === "string" && sym !== "timeout") console.log(`    sympy: ${sym}`);
    rows.push({ c, ours: o, sympyS: s?.seconds ?? null });
  }

  const find = (family: BenchFamily, blocks: number, symbolic: boolean) =>
    rows.find((r) => r.c.family === family && r.c.blocks === blocks && r.c.symbolic === symbolic);
  const verdict = (ok: boolean | null) => (ok === null ? "n/a" : ok ? "met" : "MISSED");
  const ladder150 = find("ladder", 150, false);
  const sym30 = rows.filter((r) => r.c.symbolic && r.c.blocks === 30);
  const ladderPoints = rows
    .filter((r) => r.c.family === "ladder" && !r.c.symbolic && r.ours)
    .map((r) => ({ blocks: r.c.blocks, ms: r.ours!.medianMs }));
  const exponent = ladderPoints.length >= 2 ? powerLawExponent(ladderPoints) : NaN;
  const tail = ladderPoints.filter((p) => p.blocks >= 150);
  const tailExponent = tail.length === 2 ? powerLawExponent(tail) : NaN;
  const measured = rows.filter((r) => r.ours);
  const peak = Math.max(...measured.map((r) => r.ours!.peakRssMB));
  const growth = Math.max(...measured.map((r) => r.ours!.peakRssMB - r.ours!.startRssMB));
  const start = Math.min(...measured.map((r) => r.ours!.startRssMB));

  console.log("\nTargets");
  const l = ladder150?.ours;
  const speedup = l && ladder150?.sympyS ? (ladder150.sympyS * 1000) / l.medianMs : null;
  console.log(
    `  150-block numeric ladder < 100 ms and ≥ 20× faster than sympy: ${l ? fmtMs(l.medianMs) : "-"} ms, ` +
      `${speedup ? speedup.toFixed(1) : "-"}× → ${verdict(l && speedup ? l.medianMs < 100 && speedup >= 20 : null)}`,
  );
  for (const r of sym30) {
    const ok = r.ours && r.sympyS ? r.ours.medianMs < 300 && r.ours.medianMs < r.sympyS * 1000 : null;
    console.log(
      `  30-block ${r.c.family}, 3 parameters < 300 ms and faster than sympy: ${r.ours ? fmtMs(r.ours.medianMs) : "-"} ms vs ` +
        `${r.sympyS !== null ? (r.sympyS * 1000).toFixed(0) : "-"} ms → ${verdict(ok)}`,
    );
  }
  console.log(
    `  power-law exponent of time vs blocks, numeric ladders (20…500) ≤ 2: ${exponent.toFixed(2)} ` +
      `(150→500 alone: ${tailExponent.toFixed(2)}) → ${verdict(Number.isFinite(exponent) ? exponent <= 2 : null)}`,
  );
  console.log(
    `  peak memory < 200 MB: whole case process ${peak.toFixed(0)} MB → ${verdict(measured.length ? peak < 200 : null)} ` +
      `(of which ≥ ${start.toFixed(0)} MB is node + tsx + loaded modules before any reduction); ` +
      `growth during reductions ≤ ${growth.toFixed(0)} MB → ${verdict(measured.length ? growth < 200 : null)}`,
  );
}

const caseArg = process.argv.indexOf("--case");
if (caseArg >= 0) measureCase(process.argv[caseArg + 1]);
else await main();
