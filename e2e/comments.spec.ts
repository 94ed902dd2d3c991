import { readFile } from "node:fs/promises";
import { expect, test, type Page } from "@playwright/test";
import { createTeam, joinAsViewer, seedDiagram, signUp, uniqueEmail } from "./helpers";
import { unityLoop } from "./loops";

// Review comments as a team uses them (common practice for review tools: every member may comment, the diagram's
// author and the thread's participants hear of it by mail with a link to the comment).

const canvas = (page: Page) => page.getByRole("application", { name: "Diagram canvas" });
const mailLink = async (page: Page, to: string, about: RegExp) => {
  await page.goto("/dev/mailbox");
  const mail = page.getByRole("article").filter({ hasText: `To ${to}` }).filter({ hasText: about }).first();
  await expect(mail).toBeVisible();
  const url = new URL((await mail.getByRole("link", { name: /comment=/ }).getAttribute("href"))!);
  return url.pathname + url.search;
};

test("a viewer pins a comment on a block; the author is mailed a link that opens the thread; reply, resolve and show resolved", async ({ page, browser }) => {
  test.setTimeout(240_000);
  const ownerEmail = uniqueEmail("author");
  await signUp(page, "Aino Author", ownerEmail);
  const teamName = `Press line ${Date.now()}`;
  const teamId = await createTeam(page, teamName);
  const id = await seedDiagram(page, teamId, unityLoop("Ram position loop", "4/(s*(s + 2))"), "First cut");

  // The author invites a viewer, who joins through the mailed invitation.
  const { viewer: reviewer, context: reviewerContext, email: viewerEmail } = await joinAsViewer(page, browser, { id: teamId, name: teamName }, "Ravi Reviewer");

  // The viewer selects the plant and comments on it: the form suggests the selected block as the pin.
  await reviewer.goto(`/diagrams/${id}`);
  await expect(canvas(reviewer)).toBeVisible({ timeout: 60_000 });
  const plant = reviewer.getByRole("group", { name: "Transfer function G", exact: true });
  await expect(async () => {
    await plant.click();
    await expect(reviewer.getByRole("complementary", { name: "Properties" }).getByRole("heading", { name: /G/ })).toBeVisible({ timeout: 2_000 });
  }).toPass({ timeout: 30_000 });
  await reviewer.getByRole("tab", { name: "Comments" }).click();
  const panel = reviewer.getByRole("complementary", { name: "Review comments" });
  await expect(panel.getByText("Comments on version 1.")).toBeVisible();
  await expect(panel.getByLabel("Pin to")).toHaveValue("block:G");
  await panel.getByLabel("New comment").fill("Is the gain 4 in N/mm or in mm/V here?");
  await panel.getByRole("button", { name: "Add comment" }).click();
  const thread = panel.getByRole("article", { name: "Comment 1" });
  await expect(thread).toContainText("Comment 1 on block G");
  await expect(thread).toContainText("Is the gain 4 in N/mm or in mm/V here?");
  await expect(reviewer.getByRole("tab", { name: "Comments (1 open)" })).toBeVisible();
  // The pin is on the canvas, next to its block, and opens the thread.
  const pin = reviewer.getByRole("button", { name: "Comment 1 on block G" });
  await expect(pin).toBeVisible();
  const [pinBox, blockBox] = [await pin.boundingBox(), await plant.boundingBox()];
  expect(Math.abs(pinBox!.x - (blockBox!.x + blockBox!.width))).toBeLessThan(40);
  expect(blockBox!.y - (pinBox!.y + pinBox!.height)).toBeGreaterThanOrEqual(0);
  expect(blockBox!.y - (pinBox!.y + pinBox!.height)).toBeLessThan(20);
  await reviewer.getByRole("tab", { name: "Properties" }).click();
  await pin.click();
  await expect(thread).toBeVisible();
  // The figure with open comments carries the pin and its words.
  await reviewer.getByRole("toolbar", { name: "Editor" }).getByRole("button", { name: "Export" }).click();
  const [download] = await Promise.all([reviewer.waitForEvent("download"), reviewer.getByRole("menuitem", { name: "Figure with open comments (SVG)" }).click()]);
  const svg = await readFile((await download.path())!, "utf8");
  expect(svg).toContain("Comment 1 on block G");

  // The author (the diagram's creator and version 1's author) got the mail; its link opens the thread on version 1.
  const link = await mailLink(page, ownerEmail, /Ravi Reviewer/);
  expect(link).toMatch(new RegExp(`^/diagrams/${id}\\?version=1&comment=`));
  await page.goto(link);
  await expect(page.getByText(/You are looking at v1,/)).toBeVisible({ timeout: 60_000 });
  const ownPanel = page.getByRole("complementary", { name: "Review comments" });
  const ownThread = ownPanel.getByRole("article", { name: "Comment 1" });
  await expect(ownThread).toContainText("Is the gain 4 in N/mm or in mm/V here?");
  await expect(page.getByRole("button", { name: "Comment 1 on block G" })).toBeVisible();
  await ownThread.getByLabel("Reply to comment 1").fill("N/mm: the load cell's scaling is in the plant.");
  await ownThread.getByRole("button", { name: "Reply" }).click();
  await expect(ownThread).toContainText("N/mm: the load cell's scaling is in the plant.");
  await expect(ownThread).toContainText("Aino Author");

  // The reviewer took part in the thread: the reply reaches them too.
  await expect.poll(async () => (await reviewer.request.get("/dev/mailbox")).text(), { timeout: 10_000 }).toContain(`To ${viewerEmail}`);

  // Resolved threads leave the list and the canvas until asked for.
  await ownThread.getByRole("button", { name: "Resolve" }).click();
  await expect(ownThread).toHaveCount(0);
  await expect(page.getByRole("button", { name: /^Comment 1 on block G/ })).toHaveCount(0);
  await ownPanel.getByLabel("Show resolved (1)").check();
  await expect(ownThread).toContainText("Resolved by Aino Author");
  await expect(page.getByRole("button", { name: "Comment 1 on block G, resolved" })).toBeVisible();
  await ownThread.getByRole("button", { name: "Reopen" }).click();
  await expect(ownThread.getByLabel("Reply to comment 1")).toBeVisible();
  await reviewerContext.close();
});
