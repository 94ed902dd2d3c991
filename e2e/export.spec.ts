import { readFile } from "node:fs/promises";
import { expect, test, type Page } from "@playwright/test";
import { DOMParser } from "@xmldom/xmldom";
import { createTeam, signUp, uniqueEmail } from "./helpers";
import { unityLoop } from "./loops";

/** Unity negative feedback around K/(s(s+2)): T = K/(s^2 + 2s + K) (from memory: Ogata, Modern Control Engineering). */
const LOOP = unityLoop("Exported servo", "K/(s*(s+2))", { K: 4 });
const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]; // common practice: the PNG file signature

async function openImportedLoop(page: Page) {
  await signUp(page, "Ola Exporter", uniqueEmail("exporter"));
  await createTeam(page, `Calender stack ${Date.now()}`);
  await page.getByLabel("Import JSON").setInputFiles({ name: "servo.json", mimeType: "application/json", buffer: Buffer.from(JSON.stringify(LOOP)) });
  await expect(page.getByRole("application", { name: "Diagram canvas" })).toBeVisible({ timeout: 60_000 });
}

async function downloadFromMenu(page: Page, item: string): Promise<Buffer> {
  await page.getByRole("toolbar", { name: "Editor" }).getByRole("button", { name: "Export" }).click();
  const link = page.getByRole("menu", { name: "Export version 1" }).getByRole("menuitem", { name: item });
  const [file] = await Promise.all([page.waitForEvent("download"), link.click()]);
  return readFile(await file.path());
}

test("the Export menu downloads the figure as well-formed SVG with a title per block, and as a 2x PNG", async ({ page }) => {
  await openImportedLoop(page);

  const svgText = (await downloadFromMenu(page, "Figure (SVG)")).toString("utf8");
  const errors: string[] = [];
  const svg = new DOMParser({ onError: (level, message) => void (level !== "warning" && errors.push(message)) }).parseFromString(svgText, "image/svg+xml");
  expect(errors).toEqual([]);
  expect(svg.getElementsByTagName("foreignObject").length).toBe(0);
  const groups = Array.from(svg.getElementsByTagName("g")).filter((g) => g.hasAttribute("data-block-id"));
  expect(groups.map((g) => g.getAttribute("data-block-id")).sort()).toEqual(LOOP.blocks.map((b) => b.id).sort());
  for (const g of groups) {
    const titles = Array.from(g.childNodes).filter((n) => n.nodeName === "title");
    expect(titles, `block ${g.getAttribute("data-block-id")}`).toHaveLength(1);
    expect(titles[0].textContent).toContain(g.getAttribute("data-block-id"));
  }
  const svgWidth = Number(svg.documentElement!.getAttribute("width"));

  const png = await downloadFromMenu(page, "Figure (PNG, 2×)");
  expect([...png.subarray(0, 8)]).toEqual(PNG_SIGNATURE);
  expect(png.readUInt32BE(16)).toBe(Math.round(2 * svgWidth)); // IHDR width
});

test("a bad file for Import as new version shows its error naming line and column, and adds no version", async ({ page }) => {
  await openImportedLoop(page);
  const status = page.getByRole("toolbar", { name: "Editor" }).getByRole("status");
  await expect(status).toHaveText("Saved as v1");

  await page.getByLabel("Import as new version…").setInputFiles({ name: "typo.json", mimeType: "application/json", buffer: Buffer.from('{\n  "format": "loopwright-diagram",\n  "wires": [,]\n}') });

  const alert = page.getByRole("alert").filter({ hasText: "The file was not imported as a new version" });
  await expect(alert).toContainText("typo.json is not valid JSON at line 3, column 13");
  const versions = await page.request.get(`${new URL(page.url()).pathname.replace("/diagrams/", "/api/diagrams/")}/versions`);
  expect(((await versions.json()) as { versions: { number: number }[] }).versions.map((v) => v.number)).toEqual([1]);
  await expect(status).toHaveText("Saved as v1");
});

test("a good file for Import as new version is stored as version 2 and opens on request", async ({ page }) => {
  await openImportedLoop(page);
  const retuned = { ...LOOP, parameters: { K: 9 } };
  await page.getByLabel("Import as new version…").setInputFiles({ name: "retuned.json", mimeType: "application/json", buffer: Buffer.from(JSON.stringify(retuned)) });
  await expect(page.getByText("Imported as version 2.")).toBeVisible();
  await page.getByRole("button", { name: "Open version 2" }).click();
  await expect(page.getByRole("toolbar", { name: "Editor" }).getByRole("status")).toHaveText("Saved as v2");
});
