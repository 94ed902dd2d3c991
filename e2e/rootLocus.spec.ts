import { expect, test } from "@playwright/test";
import { createTeam, seedDiagram, signUp, uniqueEmail } from "./helpers";
import { unityLoop } from "./loops";

/** Unity negative feedback around K/(s(s+1)(s+2)), K = 1 with the slider from 0.5 to 3. */
const LOOP = unityLoop("Third-order loop", "K/(s*(s+1)*(s+2))", { K: { value: 1, min: 0.5, max: 3 } });

test("the sweep tab draws the whole root locus and lists its landmarks, negative gains on request", async ({ page }) => {
  test.setTimeout(180_000);
  await page.setViewportSize({ width: 1400, height: 1000 });
  await signUp(page, "Lo Cus", uniqueEmail("locus"));
  const teamId = await createTeam(page, `Locus team ${Date.now()}`);
  await page.goto(`/diagrams/${await seedDiagram(page, teamId, LOOP, "Seeded by the root locus test")}`);
  await expect(page.getByRole("application", { name: "Diagram canvas" })).toBeVisible({ timeout: 60_000 });

  const panel = page.getByRole("region", { name: "Analysis", exact: true });
  await panel.getByRole("tab", { name: "Parameter sweep" }).click();
  const landmarks = panel.getByRole("table", { name: "Locus landmarks" });
  // from memory: the standard textbook example — centroid −1, asymptotes ±60° and 180°, the branches cross the
  // imaginary axis at ±j√2 when K = 6, beyond the slider's top end 3.
  await expect(landmarks.getByRole("row", { name: /Imaginary-axis crossing/ })).toContainText("K = 6", { timeout: 60_000 });
  await expect(landmarks.getByRole("row", { name: /Centroid/ })).toContainText("s = −1");
  await expect(landmarks.getByRole("row", { name: /Asymptote angles/ })).toHaveCount(1);
  await expect(panel.getByRole("img", { name: /Root locus: closed-loop poles as K runs from 0 to ∞; the slider range 0\.5 to 3 is highlighted/ })).toBeVisible();

  // Negative gains: the asymptotes for K < 0 lie at 0° and ±120° (from memory: 2kπ/(n − m)).
  await panel.getByRole("checkbox", { name: "Include negative gains" }).check();
  await expect(landmarks.getByRole("row", { name: /Asymptote angles/ })).toHaveCount(2);
  await expect(landmarks).toContainText("−120°, 0°, 120°");
  await expect(panel.getByRole("img", { name: /runs from 0 to ±∞/ })).toBeVisible();
});
