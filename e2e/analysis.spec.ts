import { expect, test, type Page } from "@playwright/test";
import { createTeam, seedDiagram, signUp, uniqueEmail } from "./helpers";
import { unityLoop } from "./loops";

/** Unity negative feedback around K/(s(s+2)), K = 4: r → e(+, −) → G → y, with G fed back into e's minus port. */
const LOOP = unityLoop("Positioner loop", "K/(s*(s+2))", { K: { value: 4, min: 0.4, max: 40, description: "positioner gain" } });

/** common practice: standard second-order formulas — for s² + 2s + K, ωn = √K, ζ = 1/√K, overshoot 100·exp(−ζπ/√(1−ζ²)) %. */
const overshootFor = (K: number) => {
  const zeta = 1 / Math.sqrt(K);
  return 100 * Math.exp((-zeta * Math.PI) / Math.sqrt(1 - zeta * zeta));
};

const percentIn = async (page: Page, row: string) => {
  const text = (await page.getByRole("row", { name: new RegExp(`^${row}`) }).getByRole("cell").first().textContent()) ?? "";
  return Number(text.replace("\u2212", "-").replace(/[^\d.-]/g, ""));
};

test("analyses the loop: verdict, Routh array, overshoot, a live K slider and a break wire picked on the canvas", async ({ page }) => {
  test.setTimeout(180_000);
  await page.setViewportSize({ width: 1400, height: 1000 });
  await signUp(page, "Ana Lyst", uniqueEmail("analyst"));
  const teamId = await createTeam(page, `Valve loop ${Date.now()}`);
  await page.goto(`/diagrams/${await seedDiagram(page, teamId, LOOP, "Seeded by the analysis test")}`);
  await expect(page.getByRole("application", { name: "Diagram canvas" })).toBeVisible({ timeout: 60_000 });

  const panel = page.getByRole("region", { name: "Analysis", exact: true });
  const summary = panel.getByRole("region", { name: "Analysis summary" });
  // from memory: Ogata, Modern Control Engineering — s² + 2s + 4 has both roots at −1 ± j√3: stable.
  await expect(summary).toContainText("Stable", { timeout: 60_000 });
  await expect(summary).toContainText("K = 4");
  await expect(summary).toContainText("Loop broken at wire w4 (default)");
  await expect(panel).toContainText("These results describe the linear model as drawn");

  // Routh array of s² + 2s + 4: rows s², s¹, s⁰ (common practice: a degree-n polynomial has n + 1 rows).
  await panel.getByRole("tab", { name: "Routh array" }).click();
  const routh = panel.getByRole("table", { name: /Routh array/ });
  await expect(routh.getByRole("rowheader")).toHaveCount(3);

  // Arrow keys move along the tabs (common practice: WAI-ARIA tabs pattern).
  await page.keyboard.press("ArrowRight");
  await expect(panel.getByRole("tab", { name: "Steady state" })).toHaveAttribute("aria-selected", "true");
  await page.keyboard.press("ArrowRight");
  const time = panel.getByRole("tab", { name: "Time response" });
  await expect(time).toBeFocused();
  await expect(time).toHaveAttribute("aria-selected", "true");

  // K = 4: ωn = 2, ζ = 0.5 → 16.3 % overshoot.
  await expect.poll(() => percentIn(page, "Overshoot")).toBeCloseTo(overshootFor(4), 1);
  // The time axis ends on a round value (common practice: an axis ends on a tick), at most two significant digits.
  const stepPlot = panel.getByRole("figure", { name: /y\(t\) for t from 0 to/ }).first();
  const end = Number(/to ([\d.]+) s/.exec((await stepPlot.getAttribute("aria-label")) ?? "")?.[1]);
  expect(end).toBeGreaterThan(0);
  expect(Number(end.toPrecision(2))).toBe(end);

  // The K slider's top end is 40 (the table's max): ζ = 1/√40 → 60.5 %; the diagram itself stays saved.
  const slider = panel.getByRole("slider", { name: "K" });
  await slider.focus();
  await page.keyboard.press("End");
  await expect(summary).toContainText("K = 40");
  await expect.poll(() => percentIn(page, "Overshoot")).toBeCloseTo(overshootFor(40), 1);
  await expect(page.getByRole("toolbar", { name: "Editor" })).toContainText("Saved as v1");

  // A negative gain: s² + 2s − 1 has the root −1 + √2 > 0 (quadratic formula): unstable.
  await panel.getByLabel("K value").fill("-1");
  await expect(summary).toContainText("Unstable");
  await panel.getByRole("button", { name: /Reset K to its nominal value 4/ }).click();
  await expect(summary).toContainText("Stable");
  await expect(summary).toContainText("K = 4");

  // Break the loop at w2 instead (selected on the canvas): the margins are read from L there.
  await page.getByRole("group", { name: "Wire w2 from e to G", exact: true }).focus();
  await page.keyboard.press("Enter");
  await page.getByRole("complementary", { name: "Properties" }).getByRole("button", { name: "Break the loop here for margins" }).click();
  await expect(summary).toContainText("Loop broken at wire w2 (your choice)");
  await panel.getByRole("tab", { name: "Frequency" }).click();
  await expect(panel.getByRole("heading", { name: "Margins" })).toBeVisible();
  // common practice: |L(jω)| = 1 for L = 4/(s(s+2)) at ω² = 2(√5 − 1); PM = 180° − 90° − atan(ω/2) ≈ 51.83°.
  const wc = Math.sqrt(2 * (Math.sqrt(5) - 1));
  const pm = 90 - (Math.atan(wc / 2) * 180) / Math.PI;
  await expect.poll(() => percentIn(page, "Phase margin")).toBeCloseTo(pm, 1);
  // The Bode plot of L marks the phase margin as a labelled bar at the gain crossover, with axis titles in units.
  await panel.getByLabel("Loop gain L(jω)").check();
  const bode = panel.getByRole("figure", { name: /^Bode plot of Loop gain/ });
  await expect(bode).toContainText(`Amber bar: the phase margin, ${pm.toFixed(2)}° at ω = ${wc.toFixed(3)} rad/s.`);
  await expect(bode).toContainText(`PM ${pm.toFixed(1)}°`);
  await expect(bode).toContainText("frequency ω (rad/s)");
  await expect(bode).toContainText("phase (degrees)");
  await panel.getByRole("button", { name: "Use the default break" }).click();
  await expect(summary).toContainText("Loop broken at wire w4 (default)");
});
