import { expect, test, type Locator, type Page } from "@playwright/test";
import { demoDiagrams } from "@server/db/demoDiagrams";
import { createTeam, seedDiagram, signUp, uniqueEmail } from "./helpers";

/** The canvas's viewport transform: its computed `matrix(a, b, c, d, e, f)` read as scale a and translation (e, f). */
async function view(page: Page) {
  const css = await page.locator(".react-flow__viewport").evaluate((el) => getComputedStyle(el).transform);
  const [scale, , , , x, y] = (/matrix\(([^)]+)\)/.exec(css)?.[1] ?? "").split(",").map(Number);
  return { scale, x, y };
}
const widthOf = async (el: Locator) => (await el.boundingBox())!.width;

/** Opens the first demo loop (a PI speed loop with two parameters) in the editor at the given window size. */
async function openDemo(page: Page, size: { width: number; height: number }) {
  await page.setViewportSize(size);
  await signUp(page, "Lena Layout", uniqueEmail("layout"));
  const teamId = await createTeam(page, `Line 3 ${Date.now()}`);
  const demo = demoDiagrams[0]!;
  await page.goto(`/diagrams/${await seedDiagram(page, teamId, { ...demo.document, title: demo.title }, "Demo loop")}`);
  const canvas = page.getByRole("application", { name: "Diagram canvas" });
  await expect(canvas).toBeVisible({ timeout: 60_000 });
  await expect(page.getByLabel("Closed-loop transfer function as text")).toBeVisible({ timeout: 60_000 });
  const tabs = page.getByRole("tablist", { name: "Analysis results" });
  await expect(tabs).toBeVisible({ timeout: 60_000 });
  await page.waitForTimeout(500); // the opening fit-view animation
  return { canvas, tabs };
}

const pageOverflow = (page: Page) => page.evaluate(() => document.scrollingElement!.scrollHeight - window.innerHeight);

test("at 1440 × 900 the canvas, the closed loop and the analysis tabs show without page scroll (common practice: an editor fits its window)", async ({ page }) => {
  test.setTimeout(180_000);
  const { canvas, tabs } = await openDemo(page, { width: 1440, height: 900 });
  expect(await pageOverflow(page)).toBeLessThanOrEqual(0);
  await expect(canvas).toBeInViewport({ ratio: 1 });
  await expect(page.getByLabel("Closed-loop transfer function as text")).toBeInViewport({ ratio: 1 });
  await expect(tabs).toBeInViewport({ ratio: 1 });
  await expect(page.getByRole("toolbar", { name: "Editor" })).toBeInViewport({ ratio: 1 });
  await expect(page.getByRole("complementary", { name: "Properties" })).toBeInViewport();
  // Nothing of the page is gone: the rest is in the results column, which scrolls on its own.
  const column = page.getByRole("region", { name: "Results and analysis" });
  for (const name of [/^Problems/, "Reduction steps", "Parameters"]) await expect(column.getByRole("region", { name })).toBeAttached();
  await column.getByRole("region", { name: "Parameters" }).scrollIntoViewIfNeeded();
  await expect(column.getByRole("region", { name: "Parameters" })).toBeInViewport();
  expect(await pageOverflow(page)).toBeLessThanOrEqual(0);
  expect(await page.evaluate(() => window.scrollY)).toBe(0);

  // The saved version, opened read-only under its banner, fits the same way.
  await page.goto(`${new URL(page.url()).pathname}?version=1`);
  await expect(page.getByRole("region", { name: "Saved version" })).toBeVisible({ timeout: 60_000 });
  await expect(page.getByRole("tablist", { name: "Analysis results" })).toBeInViewport({ ratio: 1, timeout: 60_000 });
  await expect(page.getByRole("application", { name: "Diagram canvas" })).toBeInViewport({ ratio: 1 });
  await expect(page.getByLabel("Closed-loop transfer function as text")).toBeInViewport({ ratio: 1 });
  expect(await pageOverflow(page)).toBeLessThanOrEqual(0);

  // And so does the share link's read-only page.
  const diagramId = new URL(page.url()).pathname.split("/")[2];
  const origin = new URL(page.url()).origin;
  const made = await page.request.post(`/api/diagrams/${diagramId}/share-links`, { data: { version: 1, expiresInDays: 1 }, headers: { Origin: origin } });
  expect(made.ok(), await made.text()).toBe(true);
  await page.goto(new URL((await made.json()).shareLink.url).pathname);
  await expect(page.getByRole("tablist", { name: "Analysis results" })).toBeInViewport({ ratio: 1, timeout: 60_000 });
  await expect(page.getByRole("application", { name: "Diagram canvas" })).toBeInViewport({ ratio: 1 });
  expect(await pageOverflow(page)).toBeLessThanOrEqual(0);
});

test("the results column resizes by keyboard and by drag, keeps its width on reload, and its plots follow (common practice: window splitter)", async ({ page }) => {
  test.setTimeout(180_000);
  await openDemo(page, { width: 1440, height: 900 });
  const column = page.getByRole("region", { name: "Results and analysis" });
  const handle = page.getByRole("separator", { name: "Width of the results column" });
  const start = await widthOf(column);
  const value = async () => Number(await handle.getAttribute("aria-valuenow"));
  expect(Math.abs((await value()) - start)).toBeLessThanOrEqual(1);

  // Keyboard: each ArrowLeft widens the column by 16 px, ArrowRight narrows it.
  await handle.focus();
  await page.keyboard.press("ArrowLeft");
  await page.keyboard.press("ArrowLeft");
  await expect.poll(() => widthOf(column)).toBeCloseTo(start + 32, 0);
  await page.keyboard.press("ArrowRight");
  await expect.poll(() => widthOf(column)).toBeCloseTo(start + 16, 0);
  expect(await value()).toBe(Math.round(start + 16));

  // Drag: the handle follows the pointer, 100 px to the left widens the column by 100 px.
  const box = (await handle.boundingBox())!;
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  await page.mouse.down();
  await page.mouse.move(box.x + box.width / 2 - 50, box.y + box.height / 2, { steps: 5 });
  await page.mouse.move(box.x + box.width / 2 - 100, box.y + box.height / 2, { steps: 5 });
  await page.mouse.up();
  await expect.poll(() => widthOf(column)).toBeCloseTo(start + 116, 0);
  expect(await pageOverflow(page)).toBeLessThanOrEqual(0);

  // The step response plot fills the column: narrowing the column narrows the plot.
  await page.getByRole("tab", { name: "Time response" }).click();
  const plot = column.getByRole("figure", { name: /y\(t\)/ }).first();
  await expect(plot).toBeVisible();
  const wide = await widthOf(plot);
  await handle.focus();
  await page.keyboard.press("Home");
  await expect.poll(() => widthOf(column)).toBeCloseTo(320, 0);
  await expect.poll(() => widthOf(plot)).toBeLessThan(wide - 100);

  // The width is remembered in this browser.
  await page.keyboard.press("Shift+ArrowLeft");
  await expect.poll(() => widthOf(column)).toBeCloseTo(384, 0);
  await page.reload();
  await expect(page.getByRole("application", { name: "Diagram canvas" })).toBeVisible({ timeout: 60_000 });
  await expect.poll(() => widthOf(column)).toBeCloseTo(384, 0);
});

test("the wheel over the canvas pans it and Ctrl + wheel zooms it, the page staying put (common practice: diagram editors)", async ({ page }) => {
  test.setTimeout(180_000);
  const { canvas } = await openDemo(page, { width: 1440, height: 900 });
  const box = (await canvas.boundingBox())!;
  await page.mouse.move(box.x + box.width / 2, box.y + box.height - 40);
  const before = await view(page);
  expect(before.scale).toBeGreaterThan(0);
  // A plain wheel moves the diagram up under the pointer, at the same zoom and with no sideways drift.
  await page.mouse.wheel(0, 120);
  await expect.poll(async () => before.y - (await view(page)).y).toBeGreaterThan(20);
  const panned = await view(page);
  expect(panned.scale).toBe(before.scale);
  expect(panned.x).toBe(before.x);
  expect(await page.evaluate(() => window.scrollY)).toBe(0);

  await page.keyboard.down("Control");
  await page.mouse.wheel(0, -200);
  await page.keyboard.up("Control");
  await expect.poll(async () => (await view(page)).scale).toBeGreaterThan(panned.scale * 1.05);
  expect(await page.evaluate(() => window.scrollY)).toBe(0);
});
