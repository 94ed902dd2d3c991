import { readFile } from "node:fs/promises";
import { expect, test } from "@playwright/test";
import { DOMParser } from "@xmldom/xmldom";
import { createTeam, seedDiagram, signUp, uniqueEmail } from "./helpers";

/** Unity feedback around K·e^(−0.5 s)/(s + 1), K = 2: a conveyor's speed loop with transport delay (invented). */
const DELAYED = {
  format: "loopwright-diagram",
  version: 1,
  title: "Conveyor with transport delay",
  parameters: { K: 2 },
  blocks: [
    { id: "r", type: "input" },
    { id: "e", type: "sum", signs: ["+", "-"] },
    { id: "c", type: "gain", expr: "K" },
    { id: "d", type: "delay", expr: "0.5" },
    { id: "G", type: "transfer", expr: "1/(s+1)" },
    { id: "y", type: "output" },
  ],
  wires: [
    { id: "w1", from: "r", to: "e", port: 0 },
    { id: "w2", from: "e", to: "c" },
    { id: "w3", from: "c", to: "d" },
    { id: "w4", from: "d", to: "G" },
    { id: "w5", from: "G", to: "y" },
    { id: "w6", from: "G", to: "e", port: 1 },
  ],
  layout: { r: { x: 0, y: 0 }, e: { x: 140, y: 0 }, c: { x: 240, y: 0 }, d: { x: 380, y: 0 }, G: { x: 540, y: 0 }, y: { x: 700, y: 0 } },
};

test("a dead-time block is drawn as e^(−sT), kept exact in the closed loop, and its Padé order is the user's", async ({ page }) => {
  test.setTimeout(180_000);
  await page.setViewportSize({ width: 1440, height: 900 });
  await signUp(page, "Dee Layton", uniqueEmail("deadtime"));
  const teamId = await createTeam(page, `Delay team ${Date.now()}`);
  await page.goto(`/diagrams/${await seedDiagram(page, teamId, DELAYED, "Seeded by the dead-time test")}`);
  await expect(page.getByRole("application", { name: "Diagram canvas" })).toBeVisible({ timeout: 60_000 });

  // The block shows e^{-0.5 s} typeset; the rail offers the kind.
  const block = page.getByRole("group", { name: "Dead time d", exact: true });
  await expect(block.locator(".katex")).toContainText("e");
  await expect(page.getByRole("navigation", { name: "Blocks" }).getByRole("button", { name: "Add dead time" })).toHaveAttribute("title", /key 8/);

  // The analysis names the Padé order and lets the user change it; the margins come from the exact e^(−jωT).
  const panel = page.getByRole("region", { name: "Analysis", exact: true });
  const bar = panel.getByRole("region", { name: "Dead times" });
  await expect(bar).toContainText("T = 0.5 s", { timeout: 60_000 });
  await expect(bar).toContainText("Padé order 3");
  await panel.getByRole("tab", { name: "Frequency" }).click();
  // Reference (exact, by hand and in tests/shared/analysis/deadTime.test.ts with scipy): PM = 180° − atan √3 − 0.5·√3 rad = 70.38°.
  const margins = panel.getByRole("region", { name: "Margins" }).first();
  await expect(margins).toContainText("70.38°");
  await bar.getByLabel("Padé order").selectOption("6");
  await expect(bar).toContainText("Padé order 6");
  await expect(margins).toContainText("70.38°");

  // The time response shows the exact dead time (simulated) beside the Padé model, in the plot, the metrics and the CSV.
  await panel.getByRole("tab", { name: "Time response" }).click();
  const metrics = panel.getByRole("region", { name: "Step metrics" });
  await expect(metrics.getByRole("columnheader", { name: "Exact dead time" })).toBeVisible();
  await expect(metrics.getByRole("columnheader", { name: "Padé order 6" })).toBeVisible();
  // Reference: tests/shared/analysis/delayedResponse.test.ts, where the simulation agrees with an RK4 simulation of
  // the block diagram (h = 1 ms) to 4e-7: exact overshoot 43.04 %, peak at 1.303 s.
  const overshoot = metrics.getByRole("row", { name: /Overshoot/ });
  await expect(overshoot.getByRole("cell").nth(1)).toHaveText(/^43\.04\d* %$/);
  await expect(panel.getByRole("figure", { name: /y\(t\) for t from 0 to/ }).first()).toContainText("exact dead time (simulated)");
  const [csv] = await Promise.all([page.waitForEvent("download"), panel.getByRole("button", { name: "Download CSV" }).click()]);
  const rows = (await readFile(await csv.path(), "utf8")).trim().split("\n");
  expect(rows[0]).toBe("t,y_pade6,y_exact");
  // Nothing reaches the output before the dead time has passed (common practice: the method of steps).
  const early = rows.slice(1).map((r) => r.split(",").map(Number)).filter(([t]) => t < 0.5);
  expect(early.length).toBeGreaterThan(5);
  expect(early.every(([, , y]) => y === 0)).toBe(true);
  expect(early.some(([, y]) => y !== 0)).toBe(true); // the Padé model moves early (its all-pass zeros)

  // The exported figure draws the dead-time block with its formula typeset as paths (no fonts, no foreignObject).
  await page.getByRole("toolbar", { name: "Editor" }).getByRole("button", { name: "Export" }).click();
  const item = page.getByRole("menu", { name: "Export version 1" }).getByRole("menuitem", { name: "Figure (SVG)" });
  const [figure] = await Promise.all([page.waitForEvent("download"), item.click()]);
  const svg = new DOMParser().parseFromString(await readFile(await figure.path(), "utf8"), "image/svg+xml");
  expect(svg.getElementsByTagName("foreignObject").length).toBe(0);
  const delayGroup = Array.from(svg.getElementsByTagName("g")).find((g) => g.getAttribute("data-block-id") === "d");
  expect(delayGroup?.getElementsByTagName("svg").length).toBe(1);
  expect(delayGroup?.getElementsByTagName("path").length ?? 0).toBeGreaterThan(3); // e, −, 1, 2, s as glyph paths

  // T with s in it is refused in words that name the kind.
  await block.click();
  const field = page.getByLabel("Dead time T in seconds (no s)");
  await field.fill("s");
  await expect(page.getByText(/not allowed in a dead time/).first()).toBeVisible();
});
