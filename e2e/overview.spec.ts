import { expect, test } from "@playwright/test";
import { createTeam, seedDiagram, signUp, uniqueEmail } from "./helpers";

const BLOCKS = 200;
const COLUMNS = 15;

/** An input, a chain of gains and an output: 200 blocks, more than the editor draws live when zoomed far out. */
function longChain() {
  const ids = ["r", ...Array.from({ length: BLOCKS - 2 }, (_, i) => `g${i + 1}`), "y"];
  const blocks = ids.map((id, i) => (i === 0 ? { id, type: "input" } : i === ids.length - 1 ? { id, type: "output" } : { id, type: "gain", expr: "1" }));
  const wires = ids.slice(1).map((to, i) => ({ from: ids[i], to }));
  const layout = Object.fromEntries(ids.map((id, i) => [id, { x: (i % COLUMNS) * 224, y: Math.floor(i / COLUMNS) * 144 }]));
  return { format: "loopwright-diagram", version: 1, title: "Long chain", parameters: {}, blocks, wires, layout };
}

test("a large diagram opens as an overview: a block is picked there, and zooming in brings back live blocks", async ({ page }) => {
  test.setTimeout(120_000);
  await page.setViewportSize({ width: 1400, height: 1000 });
  await signUp(page, "Olga Overview", uniqueEmail("overview"));
  const teamId = await createTeam(page, `Long lines ${Date.now()}`);
  const id = await seedDiagram(page, teamId, longChain(), "Seeded");
  await page.goto(`/diagrams/${id}`);

  // Fitted far out, the whole chain is one picture whose blocks are buttons, with no live blocks mounted.
  const overview = page.getByRole("group", { name: `Overview of ${BLOCKS} blocks: select a block here, double-click it or zoom in to edit` });
  await expect(overview).toBeVisible();
  await expect(overview.getByRole("button")).toHaveCount(BLOCKS);
  await expect(page.locator(".react-flow__node:visible")).toHaveCount(0);
  // 199 gains of 1 in series with no loop (common practice: the series rule multiplies them).
  await expect(page.getByLabel("Closed-loop transfer function as text")).toHaveText("1");

  // A click selects the block for the properties panel; Shift-click adds a second one.
  const g42 = overview.getByRole("button", { name: "Gain g42", exact: true });
  await g42.click();
  await expect(g42).toHaveAttribute("aria-pressed", "true");
  await expect(page.getByRole("complementary", { name: "Properties" }).getByRole("heading", { name: "Gain g42" })).toBeVisible();
  await overview.getByRole("button", { name: "Gain g43", exact: true }).click({ modifiers: ["Shift"] });
  await expect(overview.getByRole("button", { pressed: true })).toHaveCount(2);

  // A double-click zooms in on the block: the overview gives way to live blocks around it, still selected.
  await g42.dblclick();
  await expect(overview).toHaveCount(0);
  const live = page.getByRole("group", { name: "Gain g42", exact: true });
  await expect(live).toBeVisible();
  await expect(live).toHaveClass(/selected/);
  const mounted = await page.locator(".react-flow__node").count();
  expect(mounted).toBeGreaterThan(0);
  expect(mounted).toBeLessThan(BLOCKS);

  // Fitting the whole diagram again returns to the overview.
  await page.getByRole("button", { name: "Fit view" }).click();
  await expect(overview).toBeVisible();
});
