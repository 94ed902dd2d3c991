import { expect, test, type Locator, type Page } from "@playwright/test";
import { PASSWORD, createTeam, joinAsViewer, signUp, uniqueEmail } from "./helpers";

// Canvas blocks and wires are found by the accessible names the editor gives them ("Transfer function G1",
// "Wire w2 from e1 to G1"); handles are only used as drag points.
const block = (page: Page, name: string) => page.getByRole("group", { name, exact: true });
const escaped = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
/** A wire by its description; the wire where the analysis breaks the loop says so after it. */
const wire = (page: Page, name: string) => page.getByRole("group", { name: new RegExp(`^${escaped(name)}(, loop broken here for analysis)?$`) });
const handle = (page: Page, nodeId: string, handleId: string) =>
  page.locator(`.react-flow__handle[data-nodeid="${nodeId}"][data-handleid="${handleId}"]`);
const closedLoopText = (page: Page) => page.getByLabel("Closed-loop transfer function as text");
/** The displayed result without spaces and explicit `*`, so K/(s^2 + 2*s + K) reads K/(s^2+2s+K). */
const compact = async (page: Page) => ((await closedLoopText(page).textContent()) ?? "").replace(/[\s*]/g, "");

/** Where a locator sits once it has stopped moving (fit view and zoom animate the canvas). */
async function settledBox(locator: Locator) {
  let last = await locator.boundingBox();
  for (let i = 0; i < 50; i++) {
    await new Promise((r) => setTimeout(r, 100));
    const now = await locator.boundingBox();
    if (now && last && now.x === last.x && now.y === last.y && now.width === last.width) return now;
    last = now;
  }
  throw new Error("the canvas kept moving");
}

async function drag(page: Page, from: Locator, to: Locator) {
  const a = await settledBox(from);
  const b = await settledBox(to);
  await page.mouse.move(a.x + a.width / 2, a.y + a.height / 2);
  await page.mouse.down();
  await page.mouse.move(b.x + b.width / 2, b.y + b.height / 2, { steps: 12 });
  await page.mouse.up();
}

/** The editor's chunk is large (canvas, typesetting, expression parser): on a busy machine a cold load takes a while. */
const COLD_LOAD = { timeout: 60_000 };

async function openEditor(page: Page, path: string) {
  await page.goto(path);
  await expect(page.getByRole("application", { name: "Diagram canvas" })).toBeVisible(COLD_LOAD);
}

async function createDiagram(page: Page, title: string) {
  await page.getByLabel("Title").fill(title);
  await page.getByRole("button", { name: "Create diagram" }).click();
  // Creating opens the new diagram in the editor.
  await expect(page.getByRole("application", { name: "Diagram canvas" })).toBeVisible(COLD_LOAD);
  await expect(page.getByRole("heading", { level: 1, name: title })).toBeVisible();
}

async function saveVersion(page: Page, message: string) {
  await page.getByRole("toolbar", { name: "Editor" }).getByRole("button", { name: "Save version" }).click();
  const dialog = page.getByRole("dialog", { name: /Save version/ });
  await dialog.getByLabel("What changed (optional)").fill(message);
  await dialog.getByRole("button", { name: "Save version" }).click();
}

test("draws unity negative feedback around K/(s(s+2)), steps through it, saves, survives a reload and a conflict", async ({ page, browser }) => {
  test.setTimeout(180_000);
  await page.setViewportSize({ width: 1400, height: 1000 });
  const email = uniqueEmail("drafter");
  await signUp(page, "Edda Editor", email);
  await createTeam(page, `Boiler loop ${Date.now()}`);
  await createDiagram(page, "Drum level");
  const diagramUrl = page.url();

  // Blocks from the keyboard: each new block lands right of the one selected before it.
  for (const key of ["1", "2", "4", "7"]) await page.keyboard.press(key);
  for (const name of ["Input r1", "Summing junction e1", "Transfer function G1", "Output y1"]) await expect(block(page, name)).toBeVisible();
  await page.getByRole("button", { name: "Fit view" }).click();

  // Wires with the mouse, one from the properties panel with the keyboard.
  await drag(page, handle(page, "r1", "out"), handle(page, "e1", "in0"));
  await drag(page, handle(page, "e1", "out"), handle(page, "G1", "in"));
  await drag(page, handle(page, "G1", "out"), handle(page, "e1", "in1"));
  await block(page, "Transfer function G1").click();
  await page.getByLabel("Connect output to").selectOption({ label: "y1" });
  await page.getByRole("button", { name: "Connect", exact: true }).click();
  for (const name of [
    "Wire w1 from r1 to e1 port 0 (plus)",
    "Wire w2 from e1 to G1",
    "Wire w3 from G1 to e1 port 1 (minus)",
    "Wire w4 from G1 to y1",
  ])
    await expect(wire(page, name)).toBeAttached();

  // Connections that would break the format are refused, with the reason shown on the canvas.
  const refusal = page.getByRole("alert").filter({ hasText: "Not allowed" });
  await drag(page, handle(page, "r1", "out"), handle(page, "G1", "in"));
  await expect(refusal).toContainText('Block "G1" already takes its input from wire "w2"');
  await drag(page, handle(page, "G1", "out"), block(page, "Input r1"));
  await expect(refusal).toContainText('Input block "r1" is an external signal and takes no incoming wire');
  await expect(page.getByRole("group", { name: /^Wire w5/ })).toHaveCount(0);

  // The expression: a live parse error points at the character, then the real plant.
  await block(page, "Transfer function G1").click();
  const expr = page.getByLabel("Transfer function of s");
  await expr.fill("K/(s*(s+2)");
  await expect(expr).toHaveAttribute("aria-invalid", "true");
  await expect(expr).toHaveAccessibleDescription(/Syntax error at position 10: a closing parenthesis .* is missing/);
  await expr.fill("K/(s*(s+2))");
  // Now only K is wrong: it is not a declared parameter.
  await expect(page.getByRole("button", { name: "Declare parameter K = 1" })).toBeVisible();
  await expect(page.getByText("Used in expressions but not declared:")).toContainText("K");

  // Parameter K, then the closed loop appears.
  await page.getByLabel("New parameter name").fill("K");
  await page.getByLabel("New parameter value").fill("4");
  await page.getByRole("button", { name: "Add parameter" }).click();
  await expect(page.getByLabel("Nominal value of K")).toHaveValue("4");
  await expect(expr).not.toHaveAttribute("aria-invalid", "true");
  // from memory: Ogata, Modern Control Engineering — unity feedback around G gives G/(1+G) = K/(s^2+2s+K).
  await expect.poll(() => compact(page)).toBe("K/(s^2+2s+K)");

  // Signs: flipping the feedback sign on the junction itself gives positive feedback, K/(s^2+2s-K).
  // (A click that lands while the panels below the canvas re-lay out can miss the small sign: try again then.)
  const minus = page.getByRole("button", { name: "Sign of port 1 of e1: minus. Flip it" });
  const plus = page.getByRole("button", { name: "Sign of port 1 of e1: plus. Flip it" });
  await expect(async () => {
    if (await minus.isVisible()) await minus.click();
    await expect(plus).toBeVisible({ timeout: 2_000 });
  }).toPass({ timeout: 20_000 });
  // from memory: Ogata, Modern Control Engineering — positive feedback gives G/(1−G).
  await expect.poll(() => compact(page)).toBe("K/(s^2+2s-K)");

  // Undo and redo with the keyboard.
  await page.keyboard.press("Control+z");
  await expect(page.getByRole("button", { name: "Sign of port 1 of e1: minus. Flip it" })).toBeVisible();
  await expect.poll(() => compact(page)).toBe("K/(s^2+2s+K)");
  await page.keyboard.press("Control+Shift+z");
  await expect(page.getByRole("button", { name: "Sign of port 1 of e1: plus. Flip it" })).toBeVisible();
  await page.getByRole("toolbar", { name: "Editor" }).getByRole("button", { name: "Undo" }).click();
  await expect.poll(() => compact(page)).toBe("K/(s^2+2s+K)");

  // Stepping through the reduction marks what each step consumed.
  await page.getByRole("button", { name: "Next step" }).click();
  await expect(page.getByText("Step 1 of 1")).toBeVisible();
  await expect(block(page, "Transfer function G1")).toHaveAttribute("aria-current", "step");
  await expect(wire(page, "Wire w2 from e1 to G1")).toHaveAttribute("aria-current", "step");
  await expect(wire(page, "Wire w3 from G1 to e1 port 1 (minus)")).toHaveAttribute("aria-current", "step");
  await expect(block(page, "Input r1")).not.toHaveAttribute("aria-current", "step");
  await expect(wire(page, "Wire w1 from r1 to e1 port 0 (plus)")).not.toHaveAttribute("aria-current", "step");
  await expect(page.getByRole("region", { name: "Step 1" })).toContainText("Feedback loop");
  await page.getByRole("button", { name: "Stop stepping" }).click();
  await expect(block(page, "Transfer function G1")).not.toHaveAttribute("aria-current", "step");

  // Save version 1.
  await saveVersion(page, "Unity feedback around the drum");
  await expect(page.getByRole("toolbar", { name: "Editor" })).toContainText("Saved as v1");

  // An unsaved edit survives a reload as a draft (the browser asks first).
  await block(page, "Transfer function G1").click();
  await page.getByLabel("Label", { exact: true }).fill("Drum");
  await expect(page.getByRole("toolbar", { name: "Editor" })).toContainText("Unsaved changes since v1");
  const asked: string[] = [];
  page.once("dialog", (d) => {
    asked.push(d.type());
    void d.accept();
  });
  await page.reload();
  expect(asked).toEqual(["beforeunload"]);
  await expect(page.getByRole("application", { name: "Diagram canvas" })).toBeVisible(COLD_LOAD);
  const draft = page.getByRole("region", { name: "Unsaved draft" });
  await expect(draft).toContainText("made on top of v1");
  await draft.getByRole("button", { name: "Restore draft" }).click();
  await expect(block(page, "Transfer function G1 (Drum)")).toBeVisible();

  // Meanwhile a second browser saves v2 from v1…
  const otherContext = await browser.newContext();
  const other = await otherContext.newPage();
  await other.setViewportSize({ width: 1400, height: 1000 });
  await other.goto("/sign-in");
  await other.getByLabel("E-mail").fill(email);
  await other.getByLabel("Password").fill(PASSWORD);
  await other.getByRole("button", { name: "Sign in" }).click();
  await expect(other.getByRole("banner")).toContainText("Signed in as Edda Editor");
  await openEditor(other, new URL(diagramUrl).pathname);
  await block(other, "Transfer function G1").click();
  await other.getByLabel("Transfer function of s").fill("2*K/(s*(s+2))");
  await saveVersion(other, "Doubled the gain");
  await expect(other.getByRole("toolbar", { name: "Editor" })).toContainText("Saved as v2");
  await otherContext.close();

  // …so saving here is refused with the conflict dialog; nothing is overwritten.
  await saveVersion(page, "Named the plant");
  const conflict = page.getByRole("dialog", { name: "A newer version was saved" });
  await expect(conflict).toContainText("v2 by Edda Editor");
  await expect(conflict).toContainText("Doubled the gain");
  await conflict.getByRole("button", { name: "Load the newer version…" }).click();
  await conflict.getByRole("button", { name: "Discard my changes and load it" }).click();
  await expect(page.getByRole("toolbar", { name: "Editor" })).toContainText("Saved as v2");
  await expect(block(page, "Transfer function G1")).toBeVisible();
  await expect.poll(() => compact(page)).toBe("2K/(s^2+2s+2K)");

  // Another conflict, this time kept as a new diagram: v3 arrives from elsewhere (a direct API save) while
  // this page edits v2; the work lands in a new diagram and v3 stays as it was.
  await block(page, "Transfer function G1").click();
  await page.getByLabel("Label", { exact: true }).fill("Drum, tuned");
  const v3 = await page.evaluate(async (path) => {
    const detail = await (await fetch(`/api${path}`)).json();
    const res = await fetch(`/api${path}/versions`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ baseVersion: 2, message: "From the bench", document: detail.latestVersion.document }),
    });
    return res.status;
  }, new URL(diagramUrl).pathname);
  expect(v3).toBe(201);
  await saveVersion(page, "Tuned label");
  await expect(conflict).toContainText("v3 by Edda Editor");
  await conflict.getByRole("button", { name: "Save mine as a new diagram…" }).click();
  await conflict.getByLabel("Title of the new diagram").fill("Drum level, tuned copy");
  await conflict.getByRole("button", { name: "Create diagram and save" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Drum level, tuned copy" })).toBeVisible(COLD_LOAD);
  await expect(page.getByRole("toolbar", { name: "Editor" })).toContainText("Saved as v1");
  await expect(block(page, "Transfer function G1 (Drum, tuned)")).toBeVisible();
  await openEditor(page, new URL(diagramUrl).pathname);
  await expect(page.getByRole("toolbar", { name: "Editor" })).toContainText("Saved as v3");
  await expect(block(page, "Transfer function G1")).toBeVisible();
});

test("a viewer sees the same diagram and its result but cannot change it", async ({ page, browser }) => {
  test.setTimeout(180_000);
  await page.setViewportSize({ width: 1400, height: 1000 });
  const teamName = `Kiln loop ${Date.now()}`;
  await signUp(page, "Olga Owner", uniqueEmail("owner"));
  const teamId = await createTeam(page, teamName);
  await createDiagram(page, "Zone temperature");
  const diagramPath = new URL(page.url()).pathname;

  // A straight line r1 → G1 → y1 with the plant 1/(s+1), wired from the keyboard-friendly panel.
  for (const key of ["1", "4", "7"]) await page.keyboard.press(key);
  await page.keyboard.press("f");
  // The fit view animates; a click that lands mid-flight can miss its block, so select until the panel shows it.
  const select = (name: string) =>
    expect(async () => {
      await block(page, name).click();
      await expect(page.getByLabel("Connect output to")).toBeVisible({ timeout: 2_000 });
    }).toPass({ timeout: 30_000 });
  await select("Input r1");
  await page.getByLabel("Connect output to").selectOption({ label: "G1" });
  await page.getByRole("button", { name: "Connect", exact: true }).click();
  await select("Transfer function G1");
  await page.getByLabel("Connect output to").selectOption({ label: "y1" });
  await page.getByRole("button", { name: "Connect", exact: true }).click();
  await expect.poll(() => compact(page)).toBe("1/(s+1)");
  await saveVersion(page, "Open-loop plant");
  await expect(page.getByRole("toolbar", { name: "Editor" })).toContainText("Saved as v1");

  // Invite a viewer; the invitation arrives in the dev mailbox and the viewer joins through it.
  const { viewer, context: viewerContext } = await joinAsViewer(page, browser, { id: teamId, name: teamName }, "Vik Viewer");

  await openEditor(viewer, diagramPath);
  await expect(block(viewer, "Transfer function G1")).toBeVisible();
  await expect(viewer.getByRole("toolbar", { name: "Editor" })).toContainText("Read only");
  // Results are there…
  await expect.poll(() => compact(viewer)).toBe("1/(s+1)");
  // …the editing tools are not.
  await expect(viewer.getByRole("navigation", { name: "Blocks" })).toHaveCount(0);
  await expect(viewer.getByRole("button", { name: "Save version" })).toHaveCount(0);
  await expect(viewer.getByRole("button", { name: "Undo" })).toHaveCount(0);
  await expect(viewer.getByRole("button", { name: "Add parameter" })).toHaveCount(0);
  await block(viewer, "Transfer function G1").click();
  await expect(viewer.getByLabel("Transfer function of s")).not.toBeEditable();
  await expect(viewer.getByRole("button", { name: "Delete block" })).toHaveCount(0);
  // Shortcuts that edit do nothing; dragging a block does not move it.
  await viewer.keyboard.press("2");
  await viewer.keyboard.press("Delete");
  await expect(viewer.getByRole("group", { name: /^Summing junction/ })).toHaveCount(0);
  await expect(block(viewer, "Transfer function G1")).toBeVisible();
  // (A drag on a viewer's canvas pans the view, so compare G1's offset from y1, which a pan keeps.)
  const offset = async () => {
    const [g, y] = [await block(viewer, "Transfer function G1").boundingBox(), await block(viewer, "Output y1").boundingBox()];
    return { dx: Math.round(g!.x - y!.x), dy: Math.round(g!.y - y!.y) };
  };
  const before = await offset();
  await drag(viewer, block(viewer, "Transfer function G1"), viewer.getByRole("region", { name: "Closed-loop transfer function" }));
  expect(await offset()).toEqual(before);
  // And the server would refuse a save anyway.
  const status = await viewer.evaluate(async (path) => {
    const res = await fetch(`/api${path}/versions`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ baseVersion: 1, message: "", document: { format: "loopwright-diagram", version: 1, blocks: [], wires: [] } }),
    });
    return res.status;
  }, diagramPath);
  expect(status).toBe(403);
  await viewerContext.close();
});

test("keyboard editing: duplicate, copy and paste, delete, nudge, auto layout and the shortcut list", async ({ page }) => {
  test.setTimeout(180_000);
  await page.setViewportSize({ width: 1400, height: 1000 });
  await signUp(page, "Kai Keys", uniqueEmail("keys"));
  await createTeam(page, `Dryer loop ${Date.now()}`);
  await createDiagram(page, "Exhaust humidity");

  // The shortcut list opens with "?" and lists what the keys do.
  await page.keyboard.press("Shift+?");
  const help = page.getByRole("dialog", { name: "Keyboard shortcuts" });
  await expect(help.getByRole("row").filter({ hasText: "Duplicate the selected blocks" })).toContainText("Ctrl+D");
  await page.keyboard.press("Escape");
  await expect(help).toHaveCount(0);

  // Blocks deliberately out of order, then auto layout puts them left to right.
  for (const key of ["7", "4", "2", "1"]) await page.keyboard.press(key);
  await page.keyboard.press("f");
  // Fit view animates the canvas: a click during it can land beside the block.
  await settledBox(block(page, "Input r1"));
  await block(page, "Input r1").click();
  await page.getByLabel("Connect output to").selectOption({ label: "e1 port 0 (+)" });
  await page.getByRole("button", { name: "Connect", exact: true }).click();
  await block(page, "Summing junction e1").click();
  await page.getByLabel("Connect output to").selectOption({ label: "G1" });
  await page.getByRole("button", { name: "Connect", exact: true }).click();
  await block(page, "Transfer function G1").click();
  await page.getByLabel("Connect output to").selectOption({ label: "y1" });
  await page.getByRole("button", { name: "Connect", exact: true }).click();
  await page.getByLabel("Connect output to").selectOption({ label: "e1 port 1 (−)" });
  await page.getByRole("button", { name: "Connect", exact: true }).click();
  await page.getByRole("button", { name: "Auto layout" }).click();
  await expect(page.getByRole("button", { name: "Auto layout" })).toBeEnabled();
  const xOf = async (name: string) => (await block(page, name).boundingBox())!.x;
  await expect.poll(async () => [await xOf("Input r1"), await xOf("Summing junction e1"), await xOf("Transfer function G1"), await xOf("Output y1")].every((x, i, all) => i === 0 || x > all[i - 1])).toBe(true);
  await expect.poll(() => compact(page)).toBe("1/(s+2)");

  // Duplicate (Ctrl+D) and paste (Ctrl+C, Ctrl+V) make new blocks with fresh ids; Delete removes the selection.
  await block(page, "Transfer function G1").click();
  await page.keyboard.press("Control+d");
  await expect(block(page, "Transfer function G2")).toBeVisible();
  await page.keyboard.press("Delete");
  await expect(block(page, "Transfer function G2")).toHaveCount(0);
  await block(page, "Transfer function G1").click();
  await page.keyboard.press("Control+c");
  await page.keyboard.press("Control+v");
  await page.keyboard.press("Control+v");
  await expect(block(page, "Transfer function G2")).toBeVisible();
  await expect(block(page, "Transfer function G3")).toBeVisible();
  // Ctrl+A then Delete empties the sheet; one undo brings it all back with its result.
  await page.keyboard.press("Control+a");
  await page.keyboard.press("Delete");
  await expect(page.getByRole("group", { name: /^Transfer function/ })).toHaveCount(0);
  await page.keyboard.press("Control+z");
  await expect(page.getByRole("group", { name: /^Transfer function/ })).toHaveCount(3);
  await expect(wire(page, "Wire w4 from G1 to e1 port 1 (minus)")).toBeAttached();

  // Arrow keys move the selection on the grid (one undoable step per burst of presses).
  await block(page, "Output y1").click();
  const before = (await block(page, "Output y1").boundingBox())!;
  await page.keyboard.press("Escape");
  await block(page, "Output y1").click();
  await page.getByRole("toolbar", { name: "Editor" }).getByRole("button", { name: "Fit view" }).focus();
  await page.keyboard.press("ArrowDown");
  await page.keyboard.press("ArrowDown");
  await expect.poll(async () => (await block(page, "Output y1").boundingBox())!.y).toBeGreaterThan(before.y + 10);
  await page.keyboard.press("Control+z");
  await expect.poll(async () => Math.round((await block(page, "Output y1").boundingBox())!.y)).toBe(Math.round(before.y));
});
