import { chromium, type Browser, type Page } from "@playwright/test";
import { ladderDiagram, placedOnGrid } from "./diagrams";
import { startLiveServer } from "./liveServer";
import { seedDiagram, type SeededDiagram } from "./seed";

/**
 * The editor's time from an edit to the analysis shown, in headless Chromium against the real server and the
 * production build, for the 150- and 500-block ladders: a transfer block's expression is typed into the
 * properties panel, and the clock stops when the analysis panel's status leaves "Updating…" for the new
 * document (the page records its status changes itself). Also prints when the result showed and what the
 * worker reported ("Computed in", "Analysed in").
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

/** Waits until the analysis answered for the document on screen (its status names the time it took). */
async function analysisShown(page: Page): Promise<string> {
  const done = analysisStatus(page).filter({ hasText: /^Analysed in/ });
  await done.waitFor({ timeout: TIMEOUT_MS });
  return (await done.textContent()) ?? "";
}

/**
 * Records, inside the page, when the analysis panel's and the results panel's status texts change, so an edit's
 * timing does not depend on how often the bench polls.
 */
const RECORD_STATUS = `(() => {
  const marks = (window.__statusMarks = []);
  const last = new Map();
  new MutationObserver(() => {
    for (const region of document.querySelectorAll("section[aria-labelledby]")) {
      const name = document.getElementById(region.getAttribute("aria-labelledby"))?.textContent;
      if (name !== "Analysis" && name !== "Closed-loop result") continue;
      const text = region.querySelector('p[role="status"]')?.textContent ?? "";
      if (last.get(name) !== text) marks.push({ panel: name, text, at: performance.now() });
      last.set(name, text);
    }
  }).observe(document.body, { subtree: true, childList: true, characterData: true });
})()`;

interface Mark {
  panel: string;
  text: string;
  at: number;
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
    await page.evaluate(RECORD_STATUS);
    const rows: { result: number; analysis: number; reported: string }[] = [];
    for (let i = 0; i < EDITS; i++) {
      const started = await page.evaluate(() => performance.now());
      await expr.fill(`${i + 2}/(s + ${i + 3})`);
      // Done: the analysis status went to "Updating…" after the edit and then named its time again.
      const handle = await page.waitForFunction(
        (t0) => {
          const marks = (window as unknown as { __statusMarks: Mark[] }).__statusMarks.filter((m) => m.at >= t0);
          const updating = marks.findIndex((m) => m.panel === "Analysis" && m.text.startsWith("Updating"));
          const done = updating < 0 ? undefined : marks.slice(updating).find((m) => m.panel === "Analysis" && m.text.startsWith("Analysed in"));
          const result = marks.filter((m) => m.panel === "Closed-loop result" && m.text.startsWith("Computed in")).at(-1);
          return done ? { done, result: result ?? null } : null;
        },
        started,
        { timeout: TIMEOUT_MS, polling: 50 },
      );
      const { done, result } = (await handle.jsonValue()) as { done: Mark; result: Mark | null };
      rows.push({ result: result ? result.at - started : Number.NaN, analysis: done.at - started, reported: `${result?.text ?? "—"}; ${done.text}` });
    }
    return rows;
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
      const rows = await editTimes(browser, `${live.baseUrl}/diagrams/${id}`, storageState);
      const s = (xs: number[]) => `${(median(xs) / 1000).toFixed(2)} s (${xs.map((t) => (t / 1000).toFixed(2)).join(", ")})`;
      console.log(`${blocks}-block ladder: result shown ${s(rows.map((r) => r.result))}; analysis shown ${s(rows.map((r) => r.analysis))}`);
      console.log(`  worker reported: ${rows.map((r) => r.reported).join(" | ")}`);
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
