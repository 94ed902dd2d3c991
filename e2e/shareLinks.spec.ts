import { readFile } from "node:fs/promises";
import { expect, test, type Page } from "@playwright/test";
import { createTeam, seedDiagram, signUp, uniqueEmail } from "./helpers";
import { unityLoop } from "./loops";

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]; // common practice: the PNG file signature

const closedLoop = (page: Page) => page.getByLabel("Closed-loop transfer function as text");
const compact = async (page: Page) => ((await closedLoop(page).textContent()) ?? "").replace(/[\s*]/g, "");

test("an editor shares a read-only link; a browser with no session opens it, and sees the 410 page once it is revoked", async ({ page, browser }) => {
  test.setTimeout(180_000);
  await signUp(page, "Sana Share", uniqueEmail("share"));
  const teamId = await createTeam(page, `Kiln review ${Date.now()}`);
  const loop = unityLoop("Kiln draught loop", "1/(s + 1)");
  const id = await seedDiagram(page, teamId, loop, "For review");
  await page.goto(`/diagrams/${id}`);
  await expect(page.getByRole("application", { name: "Diagram canvas" })).toBeVisible({ timeout: 60_000 });

  await page.getByRole("toolbar", { name: "Editor" }).getByRole("button", { name: "Share" }).click();
  const dialog = page.getByRole("dialog", { name: "Share a read-only link" });
  await dialog.getByLabel("Version 1 only (the one open here)").check();
  await dialog.getByLabel("Expires after (days)").fill("7");
  await dialog.getByRole("button", { name: "Create link" }).click();
  const url = await dialog.getByRole("textbox", { name: "Share link" }).inputValue();
  expect(url).toMatch(/\/s\/[A-Za-z0-9_-]{43}$/);
  await expect(dialog.getByRole("table", { name: "Share links of this diagram" })).toContainText("v1");

  // A reader: a fresh context, no cookies, nothing of the team.
  const reader = await browser.newContext();
  const shared = await reader.newPage();
  const apiCalls: string[] = [];
  shared.on("request", (r) => void (new URL(r.url()).pathname.startsWith("/api/") && apiCalls.push(new URL(r.url()).pathname)));
  const opened = await shared.goto(url);
  expect(opened?.status()).toBe(200);
  expect(opened?.headers()["x-robots-tag"]).toBe("noindex");
  expect(opened?.headers()["referrer-policy"]).toBe("no-referrer");
  await expect(shared.getByRole("heading", { level: 1, name: "Kiln draught loop" })).toBeVisible();
  await expect(shared.getByText("Version 1 · shared read-only")).toBeVisible();
  await expect(shared.getByRole("group", { name: "Transfer function G", exact: true })).toBeVisible({ timeout: 60_000 });
  // common practice: unity feedback around 1/(s + 1) closes to 1/(s + 2).
  await expect.poll(() => compact(shared), { timeout: 60_000 }).toBe("1/(s+2)");
  await expect(shared.getByRole("heading", { name: "Analysis" })).toBeVisible();
  await expect(shared.getByText("Loopwright results describe linear models only.")).toBeVisible();
  // Read only, no sign-in, no way into the team, and only the link's own API was asked.
  await expect(shared.getByRole("button", { name: "Save version" })).toHaveCount(0);
  await expect(shared.getByRole("button", { name: "Share" })).toHaveCount(0);
  // The side panel describes, it does not invite changes the reader cannot make.
  const side = shared.getByRole("complementary", { name: "Properties" });
  await expect(side).toHaveText("Select a block or a wire to see its details.");
  // The figure downloads are the only links on the site, and they stay under the link's own API; the canvas
  // library's attribution leads off the site (no Referer is sent with it).
  const links = await shared.getByRole("link").evaluateAll((as) => as.map((a) => (a as HTMLAnchorElement).href));
  const token = url.split("/s/")[1]!;
  expect(links.filter((h) => new URL(h).origin === new URL(url).origin).map((h) => new URL(h).pathname + new URL(h).search)).toEqual([
    `/api/shared/${token}/export.svg?download=1`,
    `/api/shared/${token}/export.png?download=1`,
  ]);

  // The reader downloads the figure: well-formed SVG, no foreignObject, a <title> for every block; and a PNG.
  const download = async (name: string) => {
    const [file] = await Promise.all([shared.waitForEvent("download"), shared.getByRole("navigation", { name: "Downloads" }).getByRole("link", { name }).click()]);
    return { name: file.suggestedFilename(), bytes: await readFile(await file.path()) };
  };
  const svgFile = await download("Download figure (SVG)");
  expect(svgFile.name).toBe("Kiln draught loop-v1.svg");
  const parsed = await shared.evaluate((text) => {
    const doc = new DOMParser().parseFromString(text, "image/svg+xml");
    const blocks = Array.from(doc.querySelectorAll("g[data-block-id]"));
    return {
      parseErrors: doc.getElementsByTagName("parsererror").length,
      root: doc.documentElement.localName,
      foreignObjects: doc.getElementsByTagName("foreignObject").length,
      titled: blocks.map((g) => ({ id: g.getAttribute("data-block-id"), titles: Array.from(g.children).filter((c) => c.localName === "title").map((t) => t.textContent ?? "") })),
    };
  }, svgFile.bytes.toString("utf8"));
  expect(parsed.parseErrors).toBe(0);
  expect(parsed.root).toBe("svg");
  expect(parsed.foreignObjects).toBe(0);
  expect(parsed.titled.map((b) => b.id).sort()).toEqual(loop.blocks.map((b) => b.id).sort());
  for (const block of parsed.titled) {
    expect(block.titles, `block ${block.id}`).toHaveLength(1);
    expect(block.titles[0]).toContain(block.id);
  }
  const pngFile = await download("Download figure (PNG, 2×)");
  expect(pngFile.name).toBe("Kiln draught loop-v1.png");
  expect([...pngFile.bytes.subarray(0, 8)]).toEqual(PNG_SIGNATURE);
  expect(apiCalls.length).toBeGreaterThan(0);
  expect(apiCalls.every((p) => p.startsWith("/api/shared/"))).toBe(true);

  // The editor revokes it in the dialog; the team page lists it as revoked with its one opening.
  await dialog.getByRole("button", { name: /^Revoke link to v1/ }).click();
  await dialog.getByRole("button", { name: "Revoke link", exact: true }).click();
  await expect(dialog.getByRole("table", { name: "Share links of this diagram" })).toContainText("Revoked");
  await dialog.getByRole("button", { name: "Close" }).click();
  await page.goto(`/teams/${teamId}`);
  const teamLinks = page.getByRole("table", { name: "Share links of this team's diagrams" });
  await expect(teamLinks.getByRole("row", { name: /Kiln draught loop/ })).toContainText("Revoked");

  const gone = await shared.reload();
  expect(gone?.status()).toBe(410);
  await expect(shared.getByRole("heading", { name: "This share link no longer works" })).toBeVisible();
  await expect(shared.getByText("revoked")).toBeVisible();
  await reader.close();
});
