import { expect, test, type Locator, type Page } from "@playwright/test";
import { demoDiagrams } from "@server/db/demoDiagrams";
import { createTeam, seedDiagram, signUp, uniqueEmail } from "./helpers";

type Rect = { x: number; y: number; width: number; height: number };
const meets = (a: Rect, b: Rect) => a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
const block = (page: Page, name: string) => page.getByRole("group", { name, exact: true });
/** Blocks and wires the current step marks (aria-current="step" on the canvas's groups). */
const marked = (page: Page, kind: "node" | "edge") => page.getByRole("group").and(page.locator(`.react-flow__${kind}[aria-current="step"]`));
const rects = async (items: Locator) => Promise.all((await items.all()).map(async (l) => (await l.boundingBox())!));

test("stepping through the felt conveyor's reduction: numbered from 1, the feedback step marks its summing junction, the callout beside it", async ({ page }) => {
  test.setTimeout(180_000);
  await page.setViewportSize({ width: 1440, height: 900 });
  await signUp(page, "Stefan Steps", uniqueEmail("steps"));
  const teamId = await createTeam(page, `Line 3 ${Date.now()}`);
  const demo = demoDiagrams.find((d) => d.title === "Felt conveyor speed loop")!;
  await page.goto(`/diagrams/${await seedDiagram(page, teamId, { ...demo.document, title: demo.title }, "Demo loop")}`);
  await expect(page.getByRole("application", { name: "Diagram canvas" })).toBeVisible({ timeout: 60_000 });
  await expect(page.getByLabel("Closed-loop transfer function as text")).toBeVisible({ timeout: 60_000 });
  await page.waitForTimeout(500); // the opening fit-view animation

  const steps = page.getByRole("region", { name: "Reduction steps" });
  await expect(steps.getByRole("list", { name: "Reduction steps" }).getByRole("listitem").first()).toHaveText(/^1\.\s*Series/);
  await steps.getByRole("button", { name: "Next step" }).click();
  await expect(steps.getByText("Step 1 of 2")).toBeVisible();
  await expect(steps.getByRole("region", { name: "Step 1" })).toContainText("Series");
  await steps.getByRole("button", { name: "Next step" }).click();
  await expect(steps.getByText("Step 2 of 2")).toBeVisible();
  const feedback = steps.getByRole("region", { name: "Step 2" });
  await expect(feedback).toContainText("Feedback loop");
  await expect(feedback).toContainText(/Consumed blocks: .*\berr\b/);

  // The summing junction is marked with the loop's blocks; the set-point stays unmarked.
  for (const name of ["Summing junction err", "Transfer function pi (PI controller)", "Transfer function drive (drive and belt)", "Gain tacho (tachometer)"]) {
    await expect(block(page, name)).toHaveAttribute("aria-current", "step");
  }
  await expect(block(page, "Input w_ref (speed set-point)")).not.toHaveAttribute("aria-current", "step");

  // The callout with the step's result stands clear of every block and wire the step marks.
  const callout = page.getByRole("note", { name: "Result of step 2: eq2" });
  await expect(callout).toBeVisible();
  const box = (await callout.boundingBox())!;
  const blocks = await rects(marked(page, "node"));
  expect(blocks).toHaveLength(4);
  for (const b of blocks) expect(meets(box, b), `callout ${JSON.stringify(box)} over block ${JSON.stringify(b)}`).toBe(false);
  const wires = await rects(marked(page, "edge"));
  expect(wires.length).toBeGreaterThan(0);
  for (const w of wires) expect(meets(box, w), `callout ${JSON.stringify(box)} over wire ${JSON.stringify(w)}`).toBe(false);
});
