import { expect, test } from "@playwright/test";
import { createTeam, signUp, uniqueEmail } from "./helpers";
import { unityLoop } from "./loops";

/** Unity negative feedback around K/(s(s+2)): T = K/(s^2 + 2s + K) (from memory: Ogata, Modern Control Engineering). */
const LOOP = unityLoop("Imported servo", "K/(s*(s+2))", { K: 4 });

const jsonFile = (name: string, text: string) => ({ name, mimeType: "application/json", buffer: Buffer.from(text) });

test("imports a .json file through the picker and opens the new diagram's canvas, ready to download again", async ({ page }) => {
  await signUp(page, "Imre Porter", uniqueEmail("importer"));
  await createTeam(page, `Press section ${Date.now()}`);

  await page.getByLabel("Import JSON").setInputFiles(jsonFile("servo.json", JSON.stringify(LOOP, null, 2)));

  await expect(page.getByRole("application", { name: "Diagram canvas" })).toBeVisible({ timeout: 60_000 });
  await expect(page.getByRole("heading", { level: 1, name: "Imported servo" })).toBeVisible();
  await expect(page.getByRole("group", { name: "Transfer function G", exact: true })).toBeVisible();
  const closedLoop = page.getByLabel("Closed-loop transfer function as text");
  await expect.poll(async () => ((await closedLoop.textContent()) ?? "").replace(/[\s*]/g, ""), { timeout: 30_000 }).toBe("K/(s^2+2s+K)");

  await page.getByRole("toolbar", { name: "Editor" }).getByRole("button", { name: "Export" }).click();
  const menu = page.getByRole("menu", { name: "Export version 1" });
  await expect(menu.getByRole("menuitem", { name: "Figure (SVG)" })).toBeFocused();
  await page.keyboard.press("End");
  await expect(menu.getByRole("menuitem", { name: "Review sheet" })).toBeFocused();
  await page.keyboard.press("ArrowUp");
  const download = menu.getByRole("menuitem", { name: "Document (.json)" });
  await expect(download).toBeFocused();
  await expect(download).toHaveAttribute("href", /\/versions\/1\/document\.json$/);
  const [file] = await Promise.all([page.waitForEvent("download"), download.click()]);
  expect(file.suggestedFilename()).toBe("Imported servo-v1.json");
});

test("a file that is not valid JSON is refused with its line and column, and nothing is added", async ({ page }) => {
  await signUp(page, "Bea Dupload", uniqueEmail("bad-upload"));
  await createTeam(page, `Dryer hood ${Date.now()}`);

  await page.getByLabel("Import JSON").setInputFiles(jsonFile("broken.json", '{\n  "format": "loopwright-diagram",\n  "blocks": [1 2]\n}'));

  const alert = page.getByRole("alert").filter({ hasText: "The file was not imported" });
  await expect(alert).toContainText("broken.json is not valid JSON at line 3, column 16");
  await expect(page.getByText("No diagrams yet. Create the first one above.")).toBeVisible();
});

test("a diagram with an error is refused with the problem naming the block", async ({ page }) => {
  await signUp(page, "Cy Checker", uniqueEmail("bad-diagram"));
  await createTeam(page, `Size press ${Date.now()}`);
  const broken = { ...LOOP, blocks: LOOP.blocks.map((b) => (b.id === "G" ? { ...b, expr: "K/(s*(s+2)" } : b)) };

  await page.getByLabel("Import JSON").setInputFiles(jsonFile("broken-loop.json", JSON.stringify(broken)));

  const alert = page.getByRole("alert").filter({ hasText: "The file was not imported" });
  await expect(alert).toContainText("This is not a Loopwright diagram document.");
  await expect(alert.getByRole("listitem").first()).toContainText('Block "G", expr');
  await expect(page.getByText("No diagrams yet. Create the first one above.")).toBeVisible();
});
