import { expect, test, type Page } from "@playwright/test";
import { createTeam, seedDiagram, signUp, uniqueEmail } from "./helpers";
import { unityLoop } from "./loops";

const COLD_LOAD = { timeout: 60_000 };
const loop = (plant: string) => unityLoop("Spindle speed loop", plant, { K: 4 });

async function post(page: Page, path: string, data: unknown) {
  const res = await page.request.post(path, { data, headers: { Origin: new URL(page.url()).origin } });
  expect(res.status(), `POST ${path}: ${await res.text()}`).toBe(201);
  return res.json();
}

const toolbar = (page: Page) => page.getByRole("toolbar", { name: "Editor" });
const compact = async (page: Page) => ((await page.getByLabel("Closed-loop transfer function as text").first().textContent()) ?? "").replace(/[\s*]/g, "");

test("the version table summarises each check, opens a version read-only, compares two with the change highlighted, restores one", async ({ page }) => {
  test.setTimeout(180_000);
  await signUp(page, "Vera Versions", uniqueEmail("versions"));
  const teamId = await createTeam(page, `Spindle cell ${Date.now()}`);
  const id = await seedDiagram(page, teamId, loop("K/(s*(s + 2))"), "First tuning");
  await post(page, `/api/diagrams/${id}/versions`, { baseVersion: 1, message: "More damping", document: loop("K/(s*(s + 3))") });
  await post(page, `/api/diagrams/${id}/versions`, { baseVersion: 2, message: "Half-typed plant", document: loop("K/(s*(s + 3)") });

  await page.goto(`/diagrams/${id}/versions`);
  const table = page.getByRole("table", { name: "Versions" });
  const row = (n: number) => table.getByRole("row").filter({ has: page.getByRole("link", { name: `Open v${n} read-only` }) });
  // common practice: K/(s(s+2)) with K = 4 closes to 4/(s² + 2s + 4), ζ = 0.5: 16.3 % overshoot; PM = 51.8°.
  await expect(row(1)).toContainText("r → y: order 2, stable, PM 51.8°, overshoot 16.3 %");
  await expect(row(3)).toContainText("Saved with 1 problem");
  await expect(row(3)).toContainText("Half-typed plant");

  // The version saved with a problem opens read-only and says so.
  await row(3).getByRole("link", { name: "Open v3 read-only" }).click();
  await expect(page.getByRole("region", { name: "Saved version" })).toContainText("You are looking at v3");
  await expect(toolbar(page).getByRole("status")).toContainText("v3 was saved with 1 problem", COLD_LOAD);
  await expect(toolbar(page).getByRole("button", { name: "Save version" })).toHaveCount(0);

  // Compare v1 with v2: the plant is the one change, listed and highlighted on both canvases.
  await page.goto(`/diagrams/${id}/versions`);
  await page.getByLabel("Compare from v1").check();
  await page.getByLabel("Compare to v2").check();
  await page.getByRole("button", { name: "Compare v1 with v2" }).click();
  await expect(page.getByRole("heading", { level: 1 })).toContainText("v1 compared with v2");
  const changed = page.getByRole("table").filter({ hasText: "Block or parameter" });
  await expect(changed.getByRole("row").filter({ hasText: "Transfer function G" })).toContainText("K/(s*(s + 2))");
  await expect(changed.getByRole("row").filter({ hasText: "Transfer function G" })).toContainText("K/(s*(s + 3))");
  await expect(page.getByRole("group", { name: "Transfer function G, changed in this comparison" })).toHaveCount(2, COLD_LOAD);
  await expect(page.getByRole("group", { name: "Summing junction e", exact: true })).toHaveCount(2);
  await expect(page.getByRole("region", { name: "Closed loop of v1" }).getByLabel(/as text/)).toHaveText(/K\s*\/\s*\(s\^2 \+ 2\*?s \+ K\)/, COLD_LOAD);
  await expect(page.getByRole("region", { name: "Closed loop of v2" }).getByLabel(/as text/)).toHaveText(/K\s*\/\s*\(s\^2 \+ 3\*?s \+ K\)/);
  // common practice: with s + 3 the crossover of 4/(jω(jω+3)) is at ω² = (√145 − 9)/2, PM = 90° − atan(ω/3) = 67.65°, 15.83° more.
  const pm = page.getByRole("row", { name: /^Phase margin/ });
  await expect(pm).toContainText("51.83", COLD_LOAD);
  await expect(pm).toContainText("67.65");
  await expect(pm).toContainText("+15.83");
  await expect(page.getByRole("figure", { name: /Unit-step responses of v1 and v2/ })).toBeVisible();
  await expect(page.getByRole("figure", { name: /Closed-loop Bode plots of v1 and v2/ })).toBeVisible();

  // Restoring v1 saves it again as v4 and opens the editor on it.
  await page.goto(`/diagrams/${id}/versions`);
  await row(1).getByRole("button", { name: "Restore v1" }).click();
  await expect(toolbar(page)).toContainText("Saved as v4", COLD_LOAD);
  await expect.poll(() => compact(page), COLD_LOAD).toBe("K/(s^2+2s+K)");
  await page.goto(`/diagrams/${id}/versions`);
  await expect(row(4)).toContainText("Restored from v1");
});

test("the save dialog names the document's problems and stores them only once the user confirms", async ({ page }) => {
  test.setTimeout(120_000);
  await signUp(page, "Pia Problems", uniqueEmail("problems"));
  const teamId = await createTeam(page, `Press line ${Date.now()}`);
  const id = await seedDiagram(page, teamId, loop("K/(s*(s + 2))"), "First tuning");
  await page.goto(`/diagrams/${id}`);
  await page.getByRole("group", { name: "Transfer function G", exact: true }).click(COLD_LOAD);
  await page.getByLabel("Transfer function of s").fill("K/(s*(s + 2)");
  await expect(page.getByRole("heading", { name: /^Problems \(1\)/ })).toBeVisible(COLD_LOAD);

  await toolbar(page).getByRole("button", { name: "Save version" }).click();
  const dialog = page.getByRole("dialog", { name: "Save version 2" });
  await expect(dialog.getByRole("alert")).toContainText("This document has 1 problem");
  const save = dialog.getByRole("button", { name: "Save with problems" });
  await expect(save).toBeDisabled();
  await dialog.getByLabel("Save anyway, with these problems").check();
  await save.click();
  await expect(toolbar(page).getByRole("status")).toContainText("Saved as v2", COLD_LOAD);
  await expect(toolbar(page).getByRole("status")).toContainText("v2 was saved with 1 problem", COLD_LOAD);
});

test("a teammate's newer version is compared with the local changes without losing them", async ({ page }) => {
  test.setTimeout(120_000);
  await signUp(page, "Lars Local", uniqueEmail("local"));
  const teamId = await createTeam(page, `Mixer bay ${Date.now()}`);
  const id = await seedDiagram(page, teamId, loop("1/(s + 1)"), "First tuning");
  await page.goto(`/diagrams/${id}`);
  await page.getByRole("group", { name: "Transfer function G", exact: true }).click(COLD_LOAD);
  await page.getByLabel("Transfer function of s").fill("2/(s + 1)");
  await expect(toolbar(page).getByRole("status")).toContainText("Unsaved changes since v1");

  await post(page, `/api/diagrams/${id}/versions`, { baseVersion: 1, message: "Teammate's plant", document: loop("3/(s + 1)") });
  const notice = page.getByRole("status").filter({ hasText: "saved v2 after the v1 you are editing" });
  await expect(notice).toBeVisible({ timeout: 5_000 });
  await notice.getByRole("button", { name: "Compare with my changes" }).click();
  const dialog = page.getByRole("dialog", { name: "v2 compared with your changes" });
  const changed = dialog.getByRole("row").filter({ hasText: "Transfer function G" });
  await expect(changed).toContainText("3/(s + 1)");
  await expect(changed).toContainText("2/(s + 1)");
  // common practice: unity feedback around a/(s + 1) closes to a/(s + 1 + a).
  await expect(dialog.getByRole("region", { name: "Closed loop of v2" }).getByLabel(/as text/)).toHaveText(/3\s*\/\s*\(s \+ 4\)/, COLD_LOAD);
  await expect(dialog.getByRole("region", { name: "Closed loop of Your changes" }).getByLabel(/as text/)).toHaveText(/2\s*\/\s*\(s \+ 3\)/);
  await dialog.getByRole("button", { name: "Close" }).click();
  await expect(toolbar(page).getByRole("status")).toContainText("Unsaved changes since v1");
  await expect(page.getByLabel("Transfer function of s")).toHaveValue("2/(s + 1)");

  // Opening the newer version keeps the local changes as a draft, offered back on top of it.
  await notice.getByRole("button", { name: "Open v2, keep my changes as a draft" }).click();
  await expect(toolbar(page).getByRole("status")).toContainText("Saved as v2", COLD_LOAD);
  await expect.poll(() => compact(page), COLD_LOAD).toBe("3/(s+4)");
  const draft = page.getByRole("region", { name: "Unsaved draft" });
  await expect(draft).toContainText("made on top of v1");
  await draft.getByRole("button", { name: "Restore draft" }).click();
  await expect.poll(() => compact(page), COLD_LOAD).toBe("2/(s+3)");
});
