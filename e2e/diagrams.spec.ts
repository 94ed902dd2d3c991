import { expect, test } from "@playwright/test";
import { createTeam, signUp, uniqueEmail } from "./helpers";

test("an owner creates, renames, archives and restores a diagram", async ({ page }) => {
  await signUp(page, "Dana Drafter", uniqueEmail("drafter"));
  await createTeam(page, `Chiller loop ${Date.now()}`);

  // Empty title: the shared schema's message shows beside the field, nothing is sent.
  await page.getByRole("button", { name: "Create diagram" }).click();
  await expect(page.getByText("Enter a title")).toBeVisible();

  await page.getByLabel("Title").fill("Condenser fan speed");
  await page.getByLabel("Description (optional)").fill("Outer loop on head pressure.");
  await page.getByRole("button", { name: "Create diagram" }).click();
  // A new diagram opens in the editor; back on the team page it is listed.
  await expect(page.getByRole("heading", { level: 1, name: "Condenser fan speed" })).toBeVisible();
  await expect(page).toHaveURL(/\/diagrams\/[0-9a-f-]{36}$/);
  await page.goBack();
  const table = page.getByRole("table", { name: "Diagrams" });
  const row = table.getByRole("row").filter({ hasText: "Condenser fan speed" });
  await expect(row).toContainText("none yet");
  await expect(row).toContainText("Dana Drafter");
  await expect(page.getByLabel("Title")).toHaveValue("");

  await page.getByRole("button", { name: "Rename Condenser fan speed" }).click();
  const newTitle = page.getByLabel("New title");
  await expect(newTitle).toBeFocused();
  await newTitle.fill("Condenser fan speed, variant B");
  await page.getByRole("button", { name: "Save title" }).click();
  await expect(table.getByRole("link", { name: "Condenser fan speed, variant B" })).toBeVisible();
  await expect(table.getByRole("link", { name: "Condenser fan speed", exact: true })).toHaveCount(0);

  await page.getByRole("button", { name: "Archive Condenser fan speed, variant B" }).click();
  await expect(page.getByText("No diagrams yet. Create the first one above.")).toBeVisible();

  await page.getByLabel("Show archived diagrams").check();
  const archived = page.getByRole("table", { name: "Archived diagrams" });
  await expect(archived.getByRole("link", { name: "Condenser fan speed, variant B" })).toBeVisible();
  await page.getByRole("button", { name: "Restore Condenser fan speed, variant B" }).click();
  await expect(page.getByText("No archived diagrams.")).toBeVisible();
  await page.getByLabel("Show archived diagrams").uncheck();
  await expect(table.getByRole("link", { name: "Condenser fan speed, variant B" })).toBeVisible();

  // The diagram opens in the editor.
  await table.getByRole("link", { name: "Condenser fan speed, variant B" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Condenser fan speed, variant B" })).toBeVisible();
  await expect(page.getByText("No version saved yet")).toBeVisible();
  await page.getByRole("link", { name: /Back to Chiller loop/ }).click();
  await expect(page.getByRole("heading", { level: 1, name: /Chiller loop/ })).toBeVisible();
});
