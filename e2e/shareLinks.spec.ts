import { expect, test } from "@playwright/test";
import { createTeam, seedDiagram, signUp, uniqueEmail } from "./helpers";
import { unityLoop } from "./loops";

const closedLoop = (page: import("@playwright/test").Page) => page.getByLabel("Closed-loop transfer function as text");
const compact = async (page: import("@playwright/test").Page) => ((await closedLoop(page).textContent()) ?? "").replace(/[\s*]/g, "");

test("an editor shares a read-only link; a browser with no session opens it, and sees the 410 page once it is revoked", async ({ page, browser }) => {
  test.setTimeout(180_000);
  await signUp(page, "Sana Share", uniqueEmail("share"));
  const teamId = await createTeam(page, `Kiln review ${Date.now()}`);
  const id = await seedDiagram(page, teamId, unityLoop("Kiln draught loop", "1/(s + 1)"), "For review");
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
  // The canvas library's attribution is the only link, and it leads off the site (no Referer is sent with it).
  const links = await shared.getByRole("link").evaluateAll((as) => as.map((a) => (a as HTMLAnchorElement).href));
  expect(links.filter((h) => new URL(h).origin === new URL(url).origin)).toEqual([]);
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
