import { cpus } from "node:os";
import { fileURLToPath } from "node:url";
import { reduceDocument } from "@shared/reduce/reduceDiagram";
import type { BenchFamily } from "./diagrams";
import { caseOf, docOf, runCase, type Case } from "./cases";
import { median, powerLawExponent } from "./figures";
import { sympyBench, SympyTimeout, type SympyMethod } from "../support/sympy";

/**
 * Reduction benchmark: generated ladders and nested-loop chains, our engine against sympy solving the
 * same block equations exactly two ways — `linsolve` (its plain public API) and a sparse Gauss-Jordan
 * with DomainMatrix over QQ(s, params) (the fastest sympy route found). Prints figures and targets;
 * asserts nothing.
 * Each case of ours runs in a child process (its own peak RSS, killable at the time limit).
 * Run: npx tsx tests/bench/reduce.bench.ts
 */
const LIMIT_MS = 120_000;
const SELF = fileURLToPath(import.meta.url);

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


/** Degree in s of a polynomial written in the result syntax (bench display only). */
const degreeOf = (poly: string): number =>
  Math.max(/\bs\b/.test(poly) ? 1 : 0, ...[...poly.matchAll(/\bs\^(\d+)/g)].map((m) => Number(m[1])));


/** Child-process side: time our reduction of one case and report figures as JSON on stdout. */
function measureCase(name: string): void {
  const c = caseOf(name);
  const doc = docOf(c);
  const startRssMB = process.memoryUsage().rss / 1048576;
  const runs = c.blocks >= 500 ? 3 : 7;
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

const runOurs = (c: Case) => runCase<OursFigures>(SELF, c, LIMIT_MS);

type SympyOutcome = { seconds: number; degree: number } | "timeout" | string;

async function runSympy(c: Case, method: SympyMethod): Promise<SympyOutcome> {
  try {
    const r = await sympyBench(docOf(c), "r", "y", LIMIT_MS, method);
    return { seconds: r.seconds, degree: r.denominatorDegree };
  } catch (e) {
    return e instanceof SympyTimeout ? "timeout" : `failed: ${(e as Error).message}`;
  }
}

const pad = (s: string, n: number) => s.padStart(n);
const fmtMs = (ms: number) => (ms < 10 ? ms.toFixed(2) : ms < 100 ? ms.toFixed(1) : ms.toFixed(0));

const cell = (o: SympyOutcome) => (o === "timeout" ? "> limit" : typeof o === "object" ? o.seconds.toFixed(3) : "error");
const seconds = (o: SympyOutcome) => (typeof o === "object" ? o.seconds : null);
const ratioCell = (sympyS: number | null, ours: OursFigures | null) =>
  sympyS !== null && ours ? `${((sympyS * 1000) / ours.medianMs).toFixed(1)}×` : "-";

async function main(): Promise<void> {
  console.log(`Reduction benchmark — node ${process.version}, ${cpus().length} cores, per-case limit ${LIMIT_MS / 1000} s`);
  console.log("ours: median of warm runs of reduceDocument (parse, validate, reduce, every output string, all modes)");
  console.log("sympy: one pair, parsing included, python start-up excluded — linsolve (plain API) and sparse rref\n");
  const header = ["case", "blocks", "deg", "ours ms", "runs", "RSS start MB", "peak MB", "linsolve s", "rref s", "deg", "linsolve/ours", "rref/ours"];
  const widths = [18, 6, 5, 9, 5, 13, 8, 11, 9, 5, 14, 10];
  console.log(header.map((h, i) => pad(h, widths[i])).join(" "));
  const rows: { c: Case; ours: OursFigures | null; linsolveS: number | null; rrefS: number | null }[] = [];
  for (const c of CASES) {
    const ours = await runOurs(c);
    const lin = await runSympy(c, "linsolve");
    const rref = await runSympy(c, "rref");
    const o = typeof ours === "object" && !ours.error ? ours : null;
    const degree = typeof rref === "object" ? rref.degree : typeof lin === "object" ? lin.degree : null;
    const cells = [
      `${c.family}${c.symbolic ? " (K,a,tau)" : ""}`, String(c.blocks), o ? String(o.degree) : "-",
      ours === "timeout" ? "> limit" : o ? fmtMs(o.medianMs) : "error", o ? String(o.runs) : "-",
      o ? o.startRssMB.toFixed(0) : "-", o ? o.peakRssMB.toFixed(0) : "-", cell(lin), cell(rref),
      degree === null ? "-" : String(degree), ratioCell(seconds(lin), o), ratioCell(seconds(rref), o),
    ];
    console.log(cells.map((v, i) => pad(v, widths[i])).join(" "));
    if (typeof ours === "string" && ours !== "timeout") console.log(`    ours: ${ours}`);
    else if (typeof ours === "object" && ours.error) console.log(`    ours refused the diagram: ${ours.error}`);
    for (const [name, r] of [["linsolve", lin], ["rref", rref]] as const) {
      if (typeof r === "string" && r !== "timeout") console.log(`    sympy ${name}: ${r}`);
    }
    rows.push({ c, ours: o, linsolveS: seconds(lin), rrefS: seconds(rref) });
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

  console.log("\nTargets (sympy = linsolve, its plain API; the sparse-rref ratio in brackets)");
  const l = ladder150?.ours;
  const speedup = l && ladder150?.linsolveS ? (ladder150.linsolveS * 1000) / l.medianMs : null;
  console.log(
    `  150-block numeric ladder < 100 ms and ≥ 20× faster than sympy: ${l ? fmtMs(l.medianMs) : "-"} ms, ` +
      `${speedup ? speedup.toFixed(1) : "-"}× [${ratioCell(ladder150?.rrefS ?? null, l ?? null)}] → ` +
      verdict(l && speedup ? l.medianMs < 100 && speedup >= 20 : null),
  );
  for (const r of sym30) {
    const ok = r.ours && r.linsolveS ? r.ours.medianMs < 300 && r.ours.medianMs < r.linsolveS * 1000 : null;
    console.log(
      `  30-block ${r.c.family}, 3 parameters < 300 ms and faster than sympy: ${r.ours ? fmtMs(r.ours.medianMs) : "-"} ms vs ` +
        `${r.linsolveS !== null ? (r.linsolveS * 1000).toFixed(0) : "-"} ms [rref ${r.rrefS !== null ? (r.rrefS * 1000).toFixed(0) : "-"} ms] → ${verdict(ok)}`,
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
