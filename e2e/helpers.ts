import { expect, type Page } from "@playwright/test";

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
