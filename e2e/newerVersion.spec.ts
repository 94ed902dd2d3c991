import { expect, test } from "@playwright/test";
import { createTeam, seedDiagram, signUp, uniqueEmail } from "./helpers";
import { unityLoop } from "./loops";

/** A plant in unity feedback; the teammate's version changes the plant's gain. */
const loopWith = (plant: string) => unityLoop("Winder tension loop", plant);

test("an open editor learns within 5 s that a teammate saved, and opens the newer version on request", async ({ page }) => {
  test.setTimeout(120_000);
  await signUp(page, "Tess Tension", uniqueEmail("tension"));
  const teamId = await createTeam(page, `Winder line ${Date.now()}`);
  const id = await seedDiagram(page, teamId, loopWith("1/(s + 1)"), "First tuning");
  await page.goto(`/diagrams/${id}`);
  const result = page.getByLabel("Closed-loop transfer function as text");
  const compact = async () => ((await result.textContent()) ?? "").replace(/[\s*]/g, "");
  // common practice: unity feedback around 1/(s + 1) closes to 1/(s + 2).
  await expect.poll(compact, { timeout: 60_000 }).toBe("1/(s+2)");

  // A teammate's save, through the API as their editor would send it.
  const origin = new URL(page.url()).origin;
  const saved = await page.request.post(`/api/diagrams/${id}/versions`, {
    data: { baseVersion: 1, message: "Stiffer plant", document: loopWith("3/(s + 1)") },
    headers: { Origin: origin },
  });
  expect(saved.status()).toBe(201);

  const notice = page.getByRole("status").filter({ hasText: "saved v2 after the v1 you are editing" });
  await expect(notice).toBeVisible({ timeout: 5_000 });
  await notice.getByRole("button", { name: "Open v2" }).click();
  // 3/(s + 1) in unity feedback closes to 3/(s + 4).
  await expect.poll(compact, { timeout: 60_000 }).toBe("3/(s+4)");
  await expect(notice).toHaveCount(0);
});
