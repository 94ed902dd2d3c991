import { expect, test } from "@playwright/test";
import { createTeam, seedDiagram, signUp, uniqueEmail } from "./helpers";
import { unityLoop } from "./loops";

test("an owner reads the team's activity, newest first, and filters it by kind", async ({ page }) => {
  test.setTimeout(90_000);
  await signUp(page, "Otto Owner", uniqueEmail("activity"));
  const teamId = await createTeam(page, `Kiln controls ${Date.now()}`);
  const id = await seedDiagram(page, teamId, unityLoop("Kiln draught loop", "1/(s + 1)"), "First tuning");
  const restored = await page.request.post(`/api/diagrams/${id}/versions/1/restore`, { headers: { Origin: new URL(page.url()).origin } });
  expect(restored.status()).toBe(201);

  await page.goto(`/teams/${teamId}`);
  await page.getByRole("main").getByRole("link", { name: "Activity" }).click();
  const table = page.getByRole("table", { name: "Team activity, newest first" });
  await expect(table).toContainText("restored v1 of Kiln draught loop as v2");
  await expect(table).toContainText("saved v1 of Kiln draught loop");
  const rows = table.getByRole("row");
  // Header, then restored, saved, created: newest first.
  await expect(rows.nth(1)).toContainText("restored v1");

  await page.getByLabel("Kind").selectOption({ label: "Version restored" });
  await expect(table.getByRole("row")).toHaveCount(2);
  await expect(table).not.toContainText("saved v1 of");
});
