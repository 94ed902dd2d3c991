import { readFile } from "node:fs/promises";
import { expect, test } from "@playwright/test";
import { demoDiagrams } from "@server/db/demoDiagrams";
import { createTeam, seedDiagram, signUp, uniqueEmail } from "./helpers";

test("the demo speed loop's PI controller discretised with Tustin at a chosen Ts, its matrices downloaded as JSON", async ({ page }) => {
  test.setTimeout(180_000);
  await page.setViewportSize({ width: 1440, height: 900 });
  await signUp(page, "Ivo Implement", uniqueEmail("implement"));
  const teamId = await createTeam(page, `Drives ${Date.now()}`);
  const demo = demoDiagrams[0]!; // Felt conveyor speed loop: PI Kp(Ti·s + 1)/(Ti·s), Kp = 2, Ti = 0.4
  await page.goto(`/diagrams/${await seedDiagram(page, teamId, { ...demo.document, title: demo.title }, "Demo loop")}`);
  const panel = page.getByRole("region", { name: "Analysis", exact: true });
  await panel.getByRole("tab", { name: "Implementation" }).click({ timeout: 60_000 });

  await panel.getByRole("combobox", { name: "Implement", exact: true }).selectOption("pi");
  await expect(panel.getByRole("combobox", { name: "Method", exact: true })).toHaveValue("tustin");
  await panel.getByRole("textbox", { name: "Sample time Ts (s)" }).fill("0.005");
  const discrete = panel.getByRole("region", { name: "Discrete equivalent" });
  await expect(discrete).toContainText("Ts = 0.005 s", { timeout: 60_000 });

  // Reference (closed form, from memory: Tustin of Kp(1 + 1/(Ti s)) is b0 = Kp(1 + Ts/(2Ti)), b1 = −Kp(1 − Ts/(2Ti)),
  // a1 = −1): b0 = 2·(1 + 0.005/0.8) = 2.0125, b1 = −1.9875. scipy agrees:
  //   scipy.signal.cont2discrete(([2, 5], [1, 0]), 0.005, method="bilinear") → num [[2.0125, -1.9875]], den [1, -1].
  const coefficients = discrete.getByRole("table", { name: "Coefficients of H(z⁻¹)" });
  const b0 = Number(await coefficients.getByLabel("b0", { exact: true }).textContent());
  const b1 = Number(await coefficients.getByLabel("b1", { exact: true }).textContent());
  expect(Math.abs(b0 - 2.0125)).toBeLessThan(1e-15);
  expect(Math.abs(b1 + 1.9875)).toBeLessThan(1e-15);
  await expect(coefficients.getByLabel("a1", { exact: true })).toHaveText("-1.0000000000000000");
  await expect(discrete.getByRole("region", { name: "Difference equation" })).toContainText("y[k] = 2.0125000000000002*u[k] - 1.9875000000000000*u[k-1] + 1.0000000000000000*y[k-1]");
  await expect(discrete.getByRole("region", { name: "C code" })).toContainText("double pi_step(double u)");
  await expect(discrete.getByRole("figure", { name: /up to the Nyquist frequency 628\.3 rad\/s/ })).toBeVisible();

  // A sample time too long for the loop is called out against its closed-loop bandwidth.
  await panel.getByRole("textbox", { name: "Sample time Ts (s)" }).fill("0.5");
  await expect(panel.getByRole("alert").filter({ hasText: "too large for the loop" })).toContainText("closed-loop bandwidth");
  await panel.getByRole("textbox", { name: "Sample time Ts (s)" }).fill("0.005");

  // The balanced form is not available for a PI (pole at s = 0): the minimal realisation says so; its JSON has the CLI's shape.
  await panel.getByRole("combobox", { name: "State-space form", exact: true }).selectOption("minimal");
  const ss = panel.getByRole("region", { name: "State-space realisation" });
  await expect(ss.getByRole("note")).toContainText("not asymptotically stable");
  const [file] = await Promise.all([page.waitForEvent("download"), ss.getByRole("button", { name: "Download matrices (JSON)" }).click()]);
  expect(file.suggestedFilename()).toBe("state-space-pi.json");
  const json = JSON.parse(await readFile((await file.path())!, "utf8"));
  // (2s + 5)/s = 2 + 5/s: A = [[0]], B = [[1]], C = [[5]], D = [[2]] (from memory: the controllable canonical form).
  expect(json).toEqual({ form: "minimal", A: [[0]], B: [[1]], C: [[5]], D: [[2]] });
});
