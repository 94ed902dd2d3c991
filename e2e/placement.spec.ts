import { expect, test, type Locator, type Page } from "@playwright/test";
import { createTeam, signUp, uniqueEmail } from "./helpers";

// Where new blocks land (common practice for diagram editors: a dropped block stays where it was dropped, new
// blocks never cover others, a pasted copy sits apart from its original, a layout ends with everything in view).

const block = (page: Page, name: string) => page.getByRole("group", { name, exact: true });
const boxOf = async (l: Locator) => (await l.boundingBox())!;
const overlap = (a: { x: number; y: number; width: number; height: number }, b: typeof a) =>
  a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;

test("a first block dropped on an empty sheet stays where it was dropped; added, pasted and laid-out blocks never cover others", async ({ page }) => {
  test.setTimeout(180_000);
  await page.setViewportSize({ width: 1440, height: 900 });
  await signUp(page, "Pia Placer", uniqueEmail("placer"));
  await createTeam(page, `Extruder ${Date.now()}`);
  await page.getByLabel("Title").fill("Screw speed");
  await page.getByRole("button", { name: "Create diagram" }).click();
  const canvas = page.getByRole("application", { name: "Diagram canvas" });
  await expect(canvas).toBeVisible({ timeout: 60_000 });

  // Drop a transfer function near the canvas's top-left corner.
  const area = await boxOf(canvas);
  const drop = { x: area.x + 120, y: area.y + 90 };
  const data = await page.evaluateHandle(() => {
    const dt = new DataTransfer();
    dt.setData("application/x-loopwright-block", "transfer");
    return dt;
  });
  const pane = page.locator(".react-flow__pane");
  await pane.dispatchEvent("dragover", { dataTransfer: data, clientX: drop.x, clientY: drop.y });
  await pane.dispatchEvent("drop", { dataTransfer: data, clientX: drop.x, clientY: drop.y });
  const g1 = block(page, "Transfer function G1");
  await expect(g1).toBeVisible();
  await page.waitForTimeout(600); // a fit-view animation, if one wrongly ran, would have moved it by now
  const placed = await boxOf(g1);
  // The block's top-left sits 40 × 24 px up-left of the pointer, snapped to the 16 px grid.
  expect(Math.abs(placed.x - (drop.x - 40))).toBeLessThan(20);
  expect(Math.abs(placed.y - (drop.y - 24))).toBeLessThan(20);

  // Keys add blocks: with nothing selected, twice in the middle of the view — the second steps aside.
  await page.keyboard.press("Escape");
  await page.keyboard.press("3");
  await page.keyboard.press("Escape");
  await page.keyboard.press("3");
  const [k1, k2] = [await boxOf(block(page, "Gain k1")), await boxOf(block(page, "Gain k2"))];
  expect(overlap(k1, k2)).toBe(false);

  // Copy and paste the dropped block: the copy sits apart from it.
  await g1.click();
  await page.keyboard.press("Control+c");
  await page.keyboard.press("Control+v");
  const copy = await boxOf(block(page, "Transfer function G2"));
  expect(overlap(copy, await boxOf(g1))).toBe(false);

  // Auto layout ends with every block inside the canvas.
  await page.getByRole("button", { name: "Auto layout" }).click();
  await expect(page.getByRole("toolbar", { name: "Editor" }).getByRole("button", { name: "Undo" })).toHaveAttribute("title", "Undo: Auto layout");
  await page.waitForTimeout(800);
  const frame = await boxOf(canvas);
  for (const name of ["Transfer function G1", "Transfer function G2", "Gain k1", "Gain k2"]) {
    const b = await boxOf(block(page, name));
    expect(b.x >= frame.x && b.y >= frame.y && b.x + b.width <= frame.x + frame.width && b.y + b.height <= frame.y + frame.height, name).toBe(true);
  }
});
