import { expect, type Browser, type Page } from "@playwright/test";

/** Addresses no earlier run used, so tests need no database reset. */
export const uniqueEmail = (who: string) => `${who}.${Date.now()}.${Math.floor(Math.random() * 1e6)}@e2e.loopwright.test`;

export const PASSWORD = "long-enough-pass-42";

/** Signs up through the sign-up page and waits for the signed-in header. */
export async function signUp(page: Page, name: string, email: string) {
  await page.goto("/sign-up");
  await page.getByLabel("Name").fill(name);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(PASSWORD);
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByRole("banner")).toContainText(`Signed in as ${name}`);
}

/** Creates a team from /teams; the app then opens the team page. */
export async function createTeam(page: Page, name: string) {
  await page.goto("/teams");
  await page.getByLabel("Team name").fill(name);
  await page.getByRole("button", { name: "Create team" }).click();
  await expect(page.getByRole("heading", { level: 1, name })).toBeVisible();
  return page.url().split("/teams/")[1]!.split(/[/?#]/)[0]!;
}

/** Creates a diagram in the team through the API with the page's session, its version 1 the given document; returns its id. */
export async function seedDiagram(page: Page, teamId: string, document: { title: string }, message: string): Promise<string> {
  const origin = new URL(page.url()).origin;
  const post = async (path: string, data: unknown) => {
    const res = await page.request.post(path, { data, headers: { Origin: origin } });
    expect(res.ok(), `POST ${path}: ${await res.text()}`).toBe(true);
    return res.json();
  };
  const { diagram } = await post(`/api/teams/${teamId}/diagrams`, { title: document.title });
  await post(`/api/diagrams/${diagram.id}/versions`, { baseVersion: 0, message, document });
  return diagram.id;
}

/**
 * The signed-in owner on `page` invites a new viewer to the team; the viewer accepts through the mailed link in a
 * browser context of their own. Returns the viewer's page (1400 × 1000), signed in, on the team page, and their e-mail.
 */
export async function joinAsViewer(page: Page, browser: Browser, team: { id: string; name: string }, viewerName: string) {
  const email = uniqueEmail("viewer");
  await page.goto(`/teams/${team.id}/members`);
  await page.getByLabel("Colleague's e-mail").fill(email);
  await page.getByLabel("Role", { exact: true }).selectOption("viewer");
  await page.getByRole("button", { name: "Send invitation" }).click();
  await expect(page.getByRole("table", { name: "Open invitations" })).toContainText(email);
  await page.goto("/dev/mailbox");
  const link = await page.getByRole("article").filter({ hasText: `To ${email}` }).getByRole("link", { name: /\/invite\// }).getAttribute("href");
  const context = await browser.newContext();
  const viewer = await context.newPage();
  await viewer.setViewportSize({ width: 1400, height: 1000 });
  await viewer.goto(new URL(link!).pathname);
  await viewer.getByLabel("Name").fill(viewerName);
  await viewer.getByLabel("Password").fill(PASSWORD);
  await viewer.getByRole("button", { name: `Create account and join ${team.name}` }).click();
  // Joined once the team page shows (the invitation page's own heading also names the team).
  await expect(viewer).toHaveURL(new RegExp(`/teams/${team.id}$`));
  await expect(viewer.getByRole("heading", { level: 1, name: team.name, exact: true })).toBeVisible();
  return { viewer, context, email };
}
