import { expect, test } from "@playwright/test";
import { PASSWORD, createTeam, signUp, uniqueEmail } from "./helpers";

test("a wrong password is refused with a visible error and the user stays signed out", async ({ page }) => {
  const email = uniqueEmail("wrongpass");
  await signUp(page, "Ines Wrongpass", email);
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page).toHaveURL(/\/sign-in$/);

  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(`${PASSWORD}-typo`);
  await page.getByRole("button", { name: "Sign in" }).click();

  // API contract (sign-in 401); common practice: the same words for an unknown e-mail, so accounts cannot be probed.
  await expect(page.getByRole("alert")).toHaveText("E-mail or password is wrong.");
  await expect(page).toHaveURL(/\/sign-in$/);
  await expect(page.getByRole("button", { name: "Sign out" })).toHaveCount(0);
});

test("signed-out visitors are sent to sign-in and come back to the page they asked for", async ({ page }) => {
  const email = uniqueEmail("next");
  await signUp(page, "Noor Next", email);
  await page.getByRole("button", { name: "Sign out" }).click();

  await page.goto("/teams");
  await expect(page).toHaveURL(/\/sign-in\?next=%2Fteams$/);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/teams$/);
  await expect(page.getByRole("heading", { level: 1, name: "Teams" })).toBeVisible();
});

test("when the session ends mid-visit, the next request sends the user to sign-in and back", async ({ page, context }) => {
  const email = uniqueEmail("expired");
  await signUp(page, "Esa Expired", email);
  const teamId = await createTeam(page, `Dryer section ${Date.now()}`);

  // Losing the cookie stands in for an expired or revoked session; the page itself stays open.
  await context.clearCookies();
  await page.getByLabel("Title").fill("Never saved");
  await page.getByRole("button", { name: "Create diagram" }).click();

  await expect(page).toHaveURL(new RegExp(`/sign-in\\?next=%2Fteams%2F${teamId}$`));
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(new RegExp(`/teams/${teamId}$`));
  await expect(page.getByText("No diagrams yet. Create the first one above.")).toBeVisible();
});
