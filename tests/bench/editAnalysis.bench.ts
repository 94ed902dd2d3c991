import { chromium, type Browser, type Page } from "@playwright/test";
import { ladderDiagram, placedOnGrid } from "./diagrams";
import { startLiveServer } from "./liveServer";
import { seedDiagram, type SeededDiagram } from "./seed";

/**
 * The editor's time from an edit to the analysis shown, in headless Chromium against the real server and the
 * production build, for the 150- and 500-block ladders: a transfer block's expression is typed into the
 * properties panel, and the clock stops when the analysis panel's status leaves "Updating…" for the new
 * document. Also prints what the worker reported ("Computed in", "Analysed in").
 * BENCH_CLIENT_DIR=<dir> serves a client built elsewhere (e.g. `vite build --outDir <dir>` at an older commit),
 * so an older editor can be measured against today's server. Prints figures; asserts nothing.
 * Run: `npm run bench editAnalysis` (sets BENCH_DATABASE_URL).
 */
const SIZES = [150, 500];
const EDITS = 3;
const TIMEOUT_MS = 180_000;
const CHROMIUM_ARGS = ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"];

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const analysisStatus = (page: Page) => page.getByRole("region", { name: "Analysis" }).getByRole("status");
const resultStatus = (page: Page) => page.getByRole("region", { name: "Closed-loop result" }).getByRole("status").filter({ hasText: /^Computed in/ }).first();

/** Waits until the analysis answered for the document on screen (its status names the time it took). */
async function analysisShown(page: Page): Promise<string> {
  const done = analysisStatus(page).filter({ hasText: /^Analysed in/ });
  await done.waitFor({ timeout: TIMEOUT_MS });
  return (await done.textContent()) ?? "";
}

async function editTimes(browser: Browser, url: string, storageState: SeededDiagram["storageState"]) {
  const context = await browser.newContext({ storageState, viewport: { width: 1600, height: 1000 } });
  const page = await context.newPage();
  try {
    await page.goto(url);
    await analysisShown(page);
    // Select the first transfer block (a live block or, on a large diagram, its overview picture).
    await page.locator('[aria-label^="Transfer function t1"]').first().click();
    const expr = page.getByLabel("Transfer function of s");
    const times: number[] = [];
    const reported: string[] = [];
    for (let i = 0; i < EDITS; i++) {
      const started = await page.evaluate(() => performance.now());
      await expr.fill(`${i + 2}/(s + ${i + 3})`);
      await analysisStatus(page).filter({ hasText: "Updating…" }).waitFor({ timeout: 5_000 }).catch(() => undefined);
      const analysed = await analysisShown(page);
      times.push((await page.evaluate(() => performance.now())) - started);
      reported.push(`${(await resultStatus(page).textContent()) ?? ""}; ${analysed}`);
    }
    return { times, reported };
  } finally {
    await context.close();
  }
}

async function main(): Promise<void> {
  const databaseUrl = process.env.BENCH_DATABASE_URL;
  if (!databaseUrl) throw new Error("BENCH_DATABASE_URL is not set: run through `npm run bench editAnalysis`, which sets it");
  const live = await startLiveServer(databaseUrl, { clientDir: process.env.BENCH_CLIENT_DIR });
  let browser: Browser | null = null;
  try {
    browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: CHROMIUM_ARGS });
    console.log(`Edit → analysis shown${process.env.BENCH_CLIENT_DIR ? ` (client from ${process.env.BENCH_CLIENT_DIR})` : ""}; ${EDITS} edits each, debounce included`);
    for (const blocks of SIZES) {
      const { id, storageState } = await seedDiagram(live.baseUrl, placedOnGrid(ladderDiagram(blocks)), `Ladder of ${blocks} blocks`);
      const { times, reported } = await editTimes(browser, `${live.baseUrl}/diagrams/${id}`, storageState);
      console.log(`${blocks}-block ladder: median ${(median(times) / 1000).toFixed(2)} s (${times.map((t) => (t / 1000).toFixed(2)).join(", ")})`);
      console.log(`  worker reported: ${reported.join(" | ")}`);
    }
  } finally {
    await browser?.close();
    await live.stop();
  }
}

main().catch((e: Error) => {
  console.error(`✗ edit-to-analysis benchmark failed: ${e.message}`);
  process.exitCode = 1;
});
