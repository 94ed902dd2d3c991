import { expect, test, type Page } from "@playwright/test";
import { createTeam, joinAsViewer, seedDiagram, signUp, uniqueEmail } from "./helpers";
import { unityLoop } from "./loops";

/** Unity negative feedback around K/(s(s+2)) with K = 4: T = 4/(s² + 2s + 4), ζ = 0.5 (common practice). */
const LOOP = unityLoop("Winder tension loop", "K/(s*(s+2))", { K: 4 });
const COLD_LOAD = { timeout: 60_000 };

const sheet = (page: Page) => page.getByRole("article", { name: "Review sheet of Winder tension loop, version 1" });

/** Pages of a PDF: its page objects, `/Type /Page` not followed by `s` (that is the page tree). */
const pdfPages = (pdf: Buffer) => (pdf.toString("latin1").match(/\/Type\s*\/Page(?!s)/g) ?? []).length;
/** The first page's size in points, as its MediaBox gives it (common practice: A4 ≈ 595 × 842 pt, Letter 612 × 792 pt). */
const pdfPageSize = (pdf: Buffer) => {
  const box = /\/MediaBox\s*\[\s*0\s+0\s+([\d.]+)\s+([\d.]+)\s*\]/.exec(pdf.toString("latin1"));
  return box ? [Math.round(Number(box[1])), Math.round(Number(box[2]))] : null;
};

async function openImportedLoop(page: Page) {
  await signUp(page, "Ola Reviewer", uniqueEmail("sheet-owner"));
  const teamName = `Paper mill drives ${Date.now()}`;
  const teamId = await createTeam(page, teamName);
  await page.getByLabel("Import JSON").setInputFiles({ name: "winder.json", mimeType: "application/json", buffer: Buffer.from(JSON.stringify(LOOP)) });
  await expect(page.getByRole("application", { name: "Diagram canvas" })).toBeVisible(COLD_LOAD);
  return { teamId, teamName };
}

/** The sheet is complete: the figure has loaded and both plots are drawn. */
async function sheetReady(page: Page) {
  const figure = sheet(page).getByRole("img", { name: "Block diagram of Winder tension loop, version 1" });
  await expect.poll(() => figure.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth > 0), COLD_LOAD).toBe(true);
  await expect(sheet(page).getByRole("figure", { name: /^Unit-step response of v1/ })).toBeVisible(COLD_LOAD);
  await expect(sheet(page).getByRole("figure", { name: /^Closed-loop Bode plots of v1/ })).toBeVisible(COLD_LOAD);
}

test("the Export menu opens a one-page review sheet of the version that prints on A4 and on Letter", async ({ page }) => {
  test.setTimeout(120_000);
  await openImportedLoop(page);
  await page.getByRole("toolbar", { name: "Editor" }).getByRole("button", { name: "Export" }).click();
  await page.getByRole("menu", { name: "Export version 1" }).getByRole("menuitem", { name: "Review sheet" }).click();
  await expect(page).toHaveURL(/\/diagrams\/[^/]+\/versions\/1\/sheet$/);

  await expect(sheet(page).getByRole("heading", { level: 1, name: "Winder tension loop" })).toBeVisible(COLD_LOAD);
  const details = sheet(page).getByRole("definition");
  await expect(details.nth(0)).toHaveText("v1");
  await expect(details.nth(1)).toHaveText("Ola Reviewer");
  await expect(sheet(page)).toContainText("Message: Imported from a file");
  await expect(sheet(page).getByLabel("Closed-loop transfer function of v1 as text")).toHaveText("K/(s^2 + 2*s + K)", COLD_LOAD);
  // common practice: ζ = 0.5 gives exp(−πζ/√(1−ζ²)) = 16.30 % overshoot; the poles of s² + 2s + 4 are −1 ± j√3.
  await expect(sheet(page).getByRole("table", { name: "Key metrics at K = 4" })).toBeVisible();
  await expect(sheet(page).getByRole("row", { name: /^Overshoot/ })).toContainText("16.3");
  await expect(sheet(page).getByRole("row", { name: /^Poles/ })).toContainText("\u22121 ± 1.732j");
  await expect(sheet(page).getByRole("row", { name: /^Stability/ })).toContainText("stable");
  await expect(sheet(page)).toContainText("Loopwright results describe linear models only.");
  await sheetReady(page);

  // Printed, only the sheet shows: no header, navigation, controls or footer.
  await page.emulateMedia({ media: "print" });
  await expect(page.getByRole("banner")).toBeHidden();
  await expect(page.getByRole("contentinfo")).toBeHidden();
  await expect(page.getByRole("button", { name: "Print" })).toBeHidden();
  await expect(sheet(page)).toBeVisible();
  expect(pdfPages(await page.pdf({ format: "A4" }))).toBe(1);
  // Printed with the page's own paper size, the sheet asks for A4 through its @page rule.
  expect(pdfPageSize(await page.pdf({ preferCSSPageSize: true }))).toEqual([595, 842]);

  await page.emulateMedia({ media: "screen" });
  await page.getByLabel("Paper").selectOption("Letter");
  await expect(page).toHaveURL(/\?paper=letter$/);
  await sheetReady(page);
  await page.emulateMedia({ media: "print" });
  expect(pdfPages(await page.pdf({ format: "Letter" }))).toBe(1);
  expect(pdfPageSize(await page.pdf({ preferCSSPageSize: true }))).toEqual([612, 792]);

  // Print opens the browser's print dialog (replaced here, as a headless browser has none).
  await page.emulateMedia({ media: "screen" });
  await page.evaluate(() => {
    window.print = () => document.body.setAttribute("data-printed", "yes");
  });
  await page.getByRole("button", { name: "Print" }).click();
  await expect(page.locator("body")).toHaveAttribute("data-printed", "yes");
});

test("a viewer of the team opens the sheet from the versions table; a stranger is refused", async ({ page, browser }) => {
  test.setTimeout(180_000);
  const { teamId, teamName } = await openImportedLoop(page);
  const sheetPath = `${new URL(page.url()).pathname}/versions/1/sheet`;

  const { viewer } = await joinAsViewer(page, browser, { id: teamId, name: teamName }, "Vik Viewer");
  await viewer.goto(`${new URL(page.url()).origin}${sheetPath.replace(/\/1\/sheet$/, "")}`);
  await viewer.getByRole("link", { name: "Review sheet of v1" }).click();
  await expect(viewer).toHaveURL(new RegExp(`${sheetPath}$`));
  await expect(sheet(viewer).getByRole("row", { name: /^Overshoot/ })).toContainText("16.3", COLD_LOAD);

  const stranger = await (await browser.newContext()).newPage();
  await signUp(stranger, "Sam Stranger", uniqueEmail("sheet-stranger"));
  await stranger.goto(sheetPath);
  await expect(stranger.getByRole("alert")).toContainText("Could not load this diagram.", COLD_LOAD);
  await expect(stranger.getByRole("article", { name: /^Review sheet/ })).toHaveCount(0);
});

test("a version saved with problems shows them on its sheet instead of an analysis", async ({ page }) => {
  await signUp(page, "Pia Problems", uniqueEmail("sheet-problems"));
  const teamId = await createTeam(page, `Coater line ${Date.now()}`);
  const id = await seedDiagram(page, teamId, unityLoop("Coater web loop", "K/(s*(s + 2)", { K: 4 }), "Half-typed plant");
  await page.goto(`/diagrams/${id}/versions/1/sheet`);
  const sheetOf = page.getByRole("article", { name: "Review sheet of Coater web loop, version 1" });
  const alert = sheetOf.getByRole("alert");
  await expect(alert).toContainText("Version 1 was saved with problems, so it has no analysis.", COLD_LOAD);
  await expect(alert.getByRole("listitem")).toHaveText(['Block "G", expr: Syntax error at position 12: a closing parenthesis `)` is missing']);
  await expect(sheetOf.getByRole("table", { name: /^Key metrics/ })).toHaveCount(0);
  await expect(sheetOf).toContainText("Message: Half-typed plant");
  await expect(sheetOf).toContainText("Loopwright results describe linear models only.");
});

test("a sixth-order loop with a long title and message still prints on one Letter page with every metric showing", async ({ page }) => {
  test.setTimeout(120_000);
  await signUp(page, "Lee Longform", uniqueEmail("sheet-long"));
  const teamId = await createTeam(page, `Extruder line ${Date.now()}`);
  const title = "Extruder melt pressure loop with lead compensation and a lightly damped die mode";
  const plant = "K*(s+1)*(s+4)/(s*(s+2)*(s+3)*(s+5)*(s^2+s+7))";
  const message = "Raised the gain after the screw change; reviewers, please look at the margins and the die-mode ringing before sign-off";
  const id = await seedDiagram(page, teamId, unityLoop(title, plant, { K: 30 }), message);
  await page.goto(`/diagrams/${id}/versions/1/sheet?paper=letter`);
  const sheetOf = page.getByRole("article", { name: `Review sheet of ${title}, version 1` });
  await expect(sheetOf.getByRole("figure", { name: /^Closed-loop Bode plots of v1/ })).toBeVisible(COLD_LOAD);
  await expect(sheetOf.getByRole("row", { name: /^Closed-loop order/ })).toContainText("6");

  await page.emulateMedia({ media: "print" });
  // The sheet cuts what does not fit rather than spill: the last metric must lie inside its box, not under the cut.
  const box = (await sheetOf.boundingBox())!;
  const last = (await sheetOf.getByRole("row", { name: /^Bandwidth/ }).boundingBox())!;
  expect(last.y + last.height).toBeLessThanOrEqual(box.y + box.height);
  await expect(sheetOf).toContainText("Loopwright results describe linear models only.");
  expect(pdfPages(await page.pdf({ format: "Letter" }))).toBe(1);
});
