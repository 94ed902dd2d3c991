import { spawnSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { cpus, tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { reduceDocument, reduceDocumentExact } from "@shared/reduce/reduceDiagram";
import { caseName, caseOf, docOf, runCase, type Case } from "./cases";
import { median, powerLawExponent } from "./figures";
import { pariMissing, PariTimeout, runPari, type PariAnswer } from "../support/pari";

/**
 * Engine benchmark against PARI/GP (Debian's pari-gp, a general computer algebra system in C), side by side in one
 * run: the same exact closed loop of generated ladders and nested chains, ours in process and as the compiled CLI,
 * PARI's signal-by-signal elimination in a fill-reducing order chosen inside GP (tests/reference/pari_reduce.gp)
 * timed inside GP and as a whole gp process. Every case also checks that both agree exactly. Prints figures and
 * targets; asserts nothing. Each case of ours runs in a child process of its own (a fresh JIT, as a CLI run).
 * Run: npx tsx tests/bench/pari.bench.ts (or `npm run bench pari`).
 */
const LIMIT_MS = 120_000;
const PROCESS_RUNS = 3;
const SELF = fileURLToPath(import.meta.url);

/** Best of warm runs, in ms, and our printed transfer and χ for the exact comparison. */
interface OursFigures {
  /** reduceDocumentExact without a trace: the exact transfers and χ only. */
  exactMs: number;
  /** reduceDocumentExact as the product runs it: with the trace's steps and exact gains. */
  tracedMs: number;
  /** reduceDocument: that, printed (transfers, χ, every step as text and LaTeX). */
  printedMs: number;
  runs: number;
  numerator: string;
  denominator: string;
  characteristic: string;
  error?: string;
}

const CASES: Case[] = [
  ...(["ladder", "nested"] as const).flatMap((family) => [60, 150, 500].map((blocks) => ({ family, blocks, symbolic: false }))),
  ...(["ladder", "nested"] as const).map((family) => ({ family, blocks: 30, symbolic: true })),
];


/** Warm-up and measuring spans: small diagrams need many runs before the JIT has optimised the hot paths. */
const WARM_MS = 1_000;
const MEASURE_MS = 4_000;

/**
 * Best time of each variant, after rounds that warm up the JIT (not counted), over rounds that take every variant in
 * turn for MEASURE_MS (at least `runs` rounds), so a busy spell on a shared machine hits all of them alike. The
 * best, not the median: other work only ever adds time.
 */
function timeEach(runs: number, variants: (() => void)[]): number[] {
  for (const warmStart = performance.now(); performance.now() - warmStart < WARM_MS; ) for (const work of variants) work();
  const best = variants.map(() => Infinity);
  for (let round = 0, start = performance.now(); round < runs || performance.now() - start < MEASURE_MS; round++) {
    variants.forEach((work, i) => {
      const t0 = performance.now();
      work();
      best[i] = Math.min(best[i], performance.now() - t0);
    });
  }
  return best;
}

/** Child-process side: time our three variants of one case and report them as JSON on stdout. */
function measureCase(name: string): void {
  const doc = docOf(caseOf(name));
  const printed = reduceDocument(doc);
  if (!printed.ok) {
    process.stdout.write(JSON.stringify({ error: printed.problems.map((p) => p.code).join(", ") }));
    return;
  }
  const runs = 5;
  const [exactMs, tracedMs, printedMs] = timeEach(runs, [
    () => reduceDocumentExact(doc, { trace: false }),
    () => reduceDocumentExact(doc),
    () => reduceDocument(doc),
  ]);
  const figures: OursFigures = {
    exactMs,
    tracedMs,
    printedMs,
    runs,
    numerator: printed.result.transfers[0].numerator,
    denominator: printed.result.transfers[0].denominator,
    characteristic: printed.result.characteristic,
  };
  process.stdout.write(JSON.stringify(figures));
}

async function runOurs(c: Case): Promise<OursFigures | string> {
  const figures = await runCase<OursFigures>(SELF, c, LIMIT_MS);
  if (figures === "timeout") return "over the time limit";
  return typeof figures === "string" ? figures : figures.error ? `refused: ${figures.error}` : figures;
}

/** Median wall time of the compiled CLI on the case's file (node start-up, reading, reducing, printing JSON). */
function timeCliProcess(file: string): number {
  const times: number[] = [];
  for (let i = 0; i < PROCESS_RUNS; i++) {
    const t0 = performance.now();
    const r = spawnSync(process.execPath, ["dist/tools/cli/reduce.js", file, "--json"], { encoding: "utf8", maxBuffer: 256 * 1024 * 1024 });
    times.push(performance.now() - t0);
    if (r.status !== 0) throw new Error(`the compiled reduce CLI exited ${r.status}: ${r.stderr}`);
  }
  return median(times);
}

type PariOutcome = { timed: PariAnswer; processMs: number } | string;

async function runPariCase(c: Case, ours: OursFigures | null): Promise<PariOutcome> {
  const doc = docOf(c);
  const pair = { input: "r", output: "y", timeoutMs: LIMIT_MS };
  try {
    const timed = await runPari(doc, { ...pair, repeat: 7, ours: ours ?? undefined });
    const wholes: number[] = [];
    for (let i = 0; i < PROCESS_RUNS; i++) wholes.push((await runPari(doc, { ...pair, repeat: 0 })).processMs);
    return { timed, processMs: median(wholes) };
  } catch (e) {
    return e instanceof PariTimeout ? "over the time limit" : `failed: ${(e as Error).message}`;
  }
}

const fmt = (ms: number | null | undefined) =>
  ms === null || ms === undefined || !Number.isFinite(ms) ? "-" : ms < 10 ? ms.toFixed(2) : ms < 100 ? ms.toFixed(1) : ms.toFixed(0);
const pad = (s: string, n: number) => s.padStart(n);

interface Row {
  c: Case;
  ours: OursFigures | null;
  oursProcessMs: number | null;
  pari: { timed: PariAnswer; processMs: number } | null;
}

function printTargets(rows: Row[]): void {
  const verdict = (ok: boolean | null) => (ok === null ? "n/a" : ok ? "met" : "MISSED");
  const pariMs = (r: Row) => r.pari?.timed.solveMs ?? null;
  console.log("\nTargets (ours = exact transfers and χ, no trace text; PARI = its solve, order chosen in GP)");
  for (const r of rows) {
    const p = pariMs(r);
    const o = r.ours?.exactMs ?? null;
    const factor = r.c.symbolic ? 2 : 1;
    const ok = o !== null && p !== null ? o <= factor * p : null;
    const bound = r.c.symbolic ? "≤ 2× PARI" : "≤ PARI";
    const traced = r.ours && p !== null ? `; with the trace ${fmt(r.ours.tracedMs)} ms (${(r.ours.tracedMs / p).toFixed(2)}×)` : "";
    console.log(`  ${caseName(r.c).padEnd(14)} ${bound}: ${fmt(o)} ms vs ${fmt(p)} ms → ${verdict(ok)}${traced}`);
  }
  const l150 = rows.find((r) => r.c.family === "ladder" && r.c.blocks === 150 && !r.c.symbolic)?.ours;
  console.log(`  150-block ladder ≤ 10 ms: ${fmt(l150?.exactMs)} ms → ${verdict(l150 ? l150.exactMs <= 10 : null)}`);
  for (const family of ["ladder", "nested"] as const) {
    const numeric = rows.filter((r) => r.c.family === family && !r.c.symbolic);
    const oursPts = numeric.filter((r) => r.ours).map((r) => ({ blocks: r.c.blocks, ms: r.ours!.exactMs }));
    const pariPts = numeric.filter((r) => pariMs(r) !== null).map((r) => ({ blocks: r.c.blocks, ms: pariMs(r)! }));
    const eo = oursPts.length >= 2 ? powerLawExponent(oursPts) : NaN;
    const ep = pariPts.length >= 2 ? powerLawExponent(pariPts) : NaN;
    const ok = Number.isFinite(eo) && Number.isFinite(ep) ? eo <= ep + 0.05 : null;
    console.log(`  growth of ${family}s 60→500 (time ∝ blocks^k) no steeper than PARI's: k = ${eo.toFixed(2)} vs ${ep.toFixed(2)} → ${verdict(ok)}`);
  }
  const heavy = rows.filter((r) => r.ours && r.ours.printedMs - r.ours.exactMs > r.ours.exactMs);
  console.log(
    heavy.length
      ? `  finding: the trace and printing cost more than the reduction itself for ${heavy.map((r) => caseName(r.c)).join(", ")}`
      : "  the trace and printing cost less than the reduction itself in every case",
  );
}

async function main(): Promise<void> {
  console.log(`Engine benchmark against PARI/GP — node ${process.version}, ${cpus().length} cores, per-case limit ${LIMIT_MS / 1000} s`);
  console.log("ours exact: reduceDocumentExact without the trace (transfers and χ, exact, lowest terms); +trace: with the");
  console.log("  step list and its exact gains (the product's path); printed: reduceDocument (all text and LaTeX); best of warm runs");
  console.log("PARI solve: inside gp, the best of 7 batches of ≥ 20 ms (gains, graph, Markowitz order chosen in GP, the transfer); PARI χ:");
  console.log("  χ from its pivots, once (for the comparison); proc: whole processes, median of 3 (ours: node dist/tools/cli/reduce.js --json)");
  const missing = pariMissing();
  if (missing) console.log(`\nThe PARI/GP columns are skipped: ${missing}.`);
  const compiled = spawnSync(process.execPath, ["server/tools/bootstrap/compile.mjs"], { stdio: ["ignore", "ignore", "inherit"] });
  if (compiled.status !== 0) console.log("The compiled CLI could not be built: its whole-process column is skipped.");
  const header = ["case", "blocks", "deg", "ours exact", "+trace", "printed", "PARI solve", "ours/PARI", "PARI χ", "ours proc", "PARI proc", "agrees"];
  const widths = [17, 6, 4, 10, 8, 8, 10, 9, 7, 9, 9, 7];
  console.log(`\n${header.map((h, i) => pad(h, widths[i])).join(" ")}   (ms)`);
  const dir = mkdtempSync(join(tmpdir(), "loopwright-pari-bench-"));
  const rows: Row[] = [];
  try {
    for (const c of CASES) {
      const outcome = await runOurs(c);
      const ours = typeof outcome === "object" ? outcome : null;
      const file = join(dir, `${caseName(c).replace(/:/g, "-")}.json`);
      writeFileSync(file, JSON.stringify(docOf(c)));
      const oursProcessMs = ours && compiled.status === 0 ? timeCliProcess(file) : null;
      const pariOutcome = missing ? "skipped" : await runPariCase(c, ours);
      const pari = typeof pariOutcome === "object" ? pariOutcome : null;
      const t = pari?.timed;
      const agrees = t?.agrees === undefined ? "-" : t.agrees && t.lowestTerms && t.chiAgrees ? "yes" : "NO";
      const cells = [
        `${c.family}${c.symbolic ? " (K,a,tau)" : ""}`, String(c.blocks), t?.degree !== undefined ? String(t.degree) : "-",
        fmt(ours?.exactMs), fmt(ours?.tracedMs), fmt(ours?.printedMs), fmt(t?.solveMs),
        ours && t?.solveMs ? `${(ours.exactMs / t.solveMs).toFixed(2)}×` : "-", fmt(t?.chiMs), fmt(oursProcessMs), fmt(pari?.processMs), agrees,
      ];
      console.log(cells.map((v, i) => pad(v, widths[i])).join(" "));
      if (typeof outcome === "string") console.log(`    ours: ${outcome}`);
      if (typeof pariOutcome === "string" && pariOutcome !== "skipped") console.log(`    PARI/GP: ${pariOutcome}`);
      if (agrees === "NO") console.log(`    PARI/GP disagrees: ${JSON.stringify({ agrees: t?.agrees, lowestTerms: t?.lowestTerms, chiAgrees: t?.chiAgrees })}`);
      rows.push({ c, ours, oursProcessMs, pari });
    }
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
  printTargets(rows);
}

const caseArg = process.argv.indexOf("--case");
if (caseArg >= 0) measureCase(process.argv[caseArg + 1]);
else await main();
