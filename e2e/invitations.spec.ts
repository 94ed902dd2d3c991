import { expect, test } from "@playwright/test";
import { PASSWORD, createTeam, signUp, uniqueEmail } from "./helpers";

test("an owner invites a viewer by e-mail; the viewer joins and cannot create diagrams", async ({ page, browser }) => {
  const ownerEmail = uniqueEmail("owner");
  const viewerEmail = uniqueEmail("viewer");
  const teamName = `Kiln draft loop ${Date.now()}`;

  await signUp(page, "Olga Owner", ownerEmail);
  const teamId = await createTeam(page, teamName);

  // Invite from the members page.
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Members" }).click();
  await expect(page.getByRole("heading", { level: 1, name: `Members of ${teamName}` })).toBeVisible();
  await page.getByLabel("Colleague's e-mail").fill(viewerEmail);
  await page.getByLabel("Role", { exact: true }).selectOption("viewer");
  await page.getByRole("button", { name: "Send invitation" }).click();
  await expect(page.getByRole("table", { name: "Open invitations" })).toContainText(viewerEmail);

  // The fake mail service caught the e-mail; take the link from the dev mailbox page.
  await page.goto("/dev/mailbox");
  const message = page.getByRole("article").filter({ hasText: `To ${viewerEmail}` });
  await expect(message).toHaveCount(1);
  const link = await message.getByRole("link", { name: /\/invite\// }).getAttribute("href");
  expect(link).toMatch(/\/invite\/[^/]+$/);

  // A second browser context is the colleague's own browser: no session, no shared cookies.
  const colleague = await browser.newContext();
  const viewer = await colleague.newPage();
  // Same server, reached through the test's base address (PUBLIC_URL may name another host).
  await viewer.goto(new URL(link!).pathname);
  await expect(viewer.getByRole("heading", { level: 1, name: `Join ${teamName}` })).toBeVisible();
  await expect(viewer.getByText("Olga Owner", { exact: true })).toBeVisible();
  const email = viewer.getByLabel("E-mail");
  await expect(email).toHaveValue(viewerEmail);
  await expect(email).not.toBeEditable();

  await viewer.getByLabel("Name").fill("Vik Viewer");
  await viewer.getByLabel("Password").fill(PASSWORD);
  await viewer.getByRole("button", { name: `Create account and join ${teamName}` }).click();

  // Lands in the team, as a viewer.
  await expect(viewer).toHaveURL(new RegExp(`/teams/${teamId}$`));
  await expect(viewer.getByRole("heading", { level: 1, name: teamName })).toBeVisible();
  await expect(viewer.getByText("Team · you are viewer")).toBeVisible();
  await expect(viewer.getByRole("table", { name: "Diagrams" }).or(viewer.getByText("No diagrams yet."))).toBeVisible();
  // No create control for a viewer…
  await expect(viewer.getByRole("button", { name: "Create diagram" })).toHaveCount(0);
  await expect(viewer.getByLabel("Title")).toHaveCount(0);
  // …and the server refuses the request anyway (a same-origin fetch carries the session and Origin).
  const status = await viewer.evaluate(async (id) => {
    const res = await fetch(`/api/teams/${id}/diagrams`, {
      method: "POST",
      credentials: "same-origin",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ title: "Should not exist" }),
    });
    return res.status;
  }, teamId);
  expect(status).toBe(403);

  // The teams list shows the new membership.
  await viewer.getByRole("link", { name: "Teams", exact: true }).click();
  const row = viewer.getByRole("row").filter({ hasText: teamName });
  await expect(row).toContainText("Viewer");
  await expect(row).toContainText("2");

  // The owner sees the viewer among the members, and the invitation is used up.
  await page.goto(`/teams/${teamId}/members`);
  await expect(page.getByRole("table", { name: `Members of ${teamName}` })).toContainText(viewerEmail);
  await expect(page.getByText("No open invitations.")).toBeVisible();
  await colleague.close();
});

test("an invitation opened while signed in with another e-mail says so and offers sign-out", async ({ page }) => {
  const ownerEmail = uniqueEmail("owner2");
  const invitedEmail = uniqueEmail("invited");
  const teamName = `Still pressure ${Date.now()}`;
  await signUp(page, "Oskar Owner", ownerEmail);
  const teamId = await createTeam(page, teamName);
  await page.goto(`/teams/${teamId}/members`);
  await page.getByLabel("Colleague's e-mail").fill(invitedEmail);
  await page.getByRole("button", { name: "Send invitation" }).click();
  await expect(page.getByRole("table", { name: "Open invitations" })).toContainText(invitedEmail);

  await page.goto("/dev/mailbox");
  const link = await page
    .getByRole("article")
    .filter({ hasText: `To ${invitedEmail}` })
    .getByRole("link", { name: /\/invite\// })
    .getAttribute("href");

  // The owner (signed in as someone else) opens the link.
  await page.goto(new URL(link!).pathname);
  await expect(page.getByRole("alert")).toContainText(`this invitation is for ${invitedEmail}`);
  await expect(page.getByRole("button", { name: `Join ${teamName}` })).toHaveCount(0);
  await page.getByRole("main").getByRole("button", { name: "Sign out" }).click();
  await expect(page.getByRole("button", { name: `Create account and join ${teamName}` })).toBeVisible();
});
