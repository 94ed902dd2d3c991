import { expect, test, type Page } from "@playwright/test";
import { createTeam, seedDiagram, signUp, uniqueEmail } from "./helpers";
import { unityLoop } from "./loops";

const text = async (page: Page, label: string) => ((await page.getByLabel(label).textContent()) ?? "").replace(/[\s*]/g, "");

test("the closed loop shows at its nominal values beside the symbolic one, and a broken expression lists every error", async ({ page }) => {
  test.setTimeout(180_000);
  await signUp(page, "Ines Input", uniqueEmail("input"));
  const teamId = await createTeam(page, `Spindle ${Date.now()}`);
  const id = await seedDiagram(page, teamId, unityLoop("Spindle speed loop", "K/(s*(s + 2))", { K: 4 }), "Nominal gain");
  await page.goto(`/diagrams/${id}`);
  await expect(page.getByRole("application", { name: "Diagram canvas" })).toBeVisible({ timeout: 60_000 });

  // common practice: unity feedback around K/(s(s+2)) closes to K/(s² + 2s + K); at K = 4, 4/(s² + 2s + 4).
  await expect.poll(() => text(page, "Closed-loop transfer function as text"), { timeout: 60_000 }).toBe("K/(s^2+2s+K)");
  await expect.poll(() => text(page, "Closed loop at the parameter values as text"), { timeout: 60_000 }).toBe("4/(s^2+2s+4)");
  await expect(page.getByRole("region", { name: "Closed loop at the parameter values" })).toContainText("At the nominal values (K = 4)");

  // Two errors in one expression: both listed, each with its position, both marked.
  const plant = page.getByRole("group", { name: "Transfer function G", exact: true });
  await expect(async () => {
    await plant.click();
    await expect(page.getByLabel("Transfer function of s")).toBeVisible({ timeout: 2_000 });
  }).toPass({ timeout: 30_000 });
  await page.getByLabel("Transfer function of s").fill("Kx*(s+");
  const status = page.getByRole("complementary", { name: "Properties" }).getByRole("listitem");
  await expect(status.filter({ hasText: "Unknown name `Kx` at position 0" })).toBeVisible();
  await expect(status.filter({ hasText: /^Syntax error .*position 6/ })).toBeVisible();
  await expect(page.getByRole("button", { name: "Declare parameter Kx = 1" })).toBeVisible();
  // The problems panel lists both as well.
  const problems = page.getByRole("region", { name: /^Problems/ });
  await expect(problems).toContainText("Unknown name `Kx`");
  await expect(problems).toContainText("Syntax error");
});

test("on a window narrower than 1024 px the page stacks: the wheel over the canvas scrolls the page; Ctrl + wheel zooms the canvas (common practice for a canvas inside a page)", async ({ page }) => {
  test.setTimeout(120_000);
  // Where the editor fits the window (1024 px and wider) the wheel pans the canvas instead: e2e/pageLayout.spec.ts.
  await page.setViewportSize({ width: 1000, height: 900 });
  await signUp(page, "Willa Wheel", uniqueEmail("wheel"));
  const teamId = await createTeam(page, `Winder ${Date.now()}`);
  const id = await seedDiagram(page, teamId, unityLoop("Winder tension loop", "2/(s + 1)"), "First");
  await page.goto(`/diagrams/${id}`);
  const canvas = page.getByRole("application", { name: "Diagram canvas" });
  await expect(canvas).toBeVisible({ timeout: 60_000 });
  const viewport = () => page.locator(".react-flow__viewport").getAttribute("style");
  await expect.poll(async () => (await viewport()) ?? "").toContain("scale(");
  await page.waitForTimeout(500); // the opening fit-view animation
  const before = await viewport();
  const box = (await canvas.boundingBox())!;
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  await page.mouse.wheel(0, 150);
  await expect.poll(() => page.evaluate(() => window.scrollY)).toBeGreaterThan(0);
  expect(await viewport()).toBe(before);
  const scrolled = await page.evaluate(() => window.scrollY);
  // The page moved under the pointer: point at the canvas again.
  const moved = (await canvas.boundingBox())!;
  const top = Math.max(moved.y, 0);
  await page.mouse.move(moved.x + moved.width / 2, (top + moved.y + moved.height) / 2);
  await page.keyboard.down("Control");
  await page.mouse.wheel(0, -200);
  await page.keyboard.up("Control");
  await expect.poll(viewport).not.toBe(before);
  expect(await page.evaluate(() => window.scrollY)).toBe(scrolled);
});

test("the problems panel lists an algebraic loop beside an unconnected block", async ({ page }) => {
  test.setTimeout(180_000);
  await signUp(page, "Lotte Loop", uniqueEmail("loops"));
  const teamId = await createTeam(page, `Winder ${Date.now()}`);
  // common practice: positive unity feedback around a gain of 1 is singular (e = r + e); h is not yet wired in.
  const document = {
    format: "loopwright-diagram",
    version: 1,
    title: "Winder tension draft",
    parameters: {},
    blocks: [
      { id: "r", type: "input" },
      { id: "e", type: "sum", signs: ["+", "+"] },
      { id: "g", type: "gain", expr: "1" },
      { id: "y", type: "output" },
      { id: "h", type: "transfer", expr: "1/(s+1)" },
    ],
    wires: [
      { id: "w1", from: "r", to: "e", port: 0 },
      { id: "w2", from: "e", to: "g" },
      { id: "w3", from: "g", to: "y" },
      { id: "w4", from: "g", to: "e", port: 1 },
    ],
    layout: { r: { x: 0, y: 0 }, e: { x: 160, y: 0 }, g: { x: 320, y: 0 }, y: { x: 520, y: 0 }, h: { x: 320, y: 160 } },
  };
  const id = await seedDiagram(page, teamId, document, "Draft with a loose block");
  await page.goto(`/diagrams/${id}`);
  await expect(page.getByRole("application", { name: "Diagram canvas" })).toBeVisible({ timeout: 60_000 });
  const problems = page.getByRole("region", { name: /^Problems/ });
  await expect(problems).toContainText("Algebraic loop through e, g", { timeout: 60_000 });
  await expect(problems).toContainText('Transfer function "h" has no incoming wire');
});
