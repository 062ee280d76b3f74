import { expect, test, type Page } from "@playwright/test";
import { shot, signIn } from "./helpers";

const KESTREL = "Kestrel — Jupiter via Venus and Earth";

/** Open the Kestrel tour from the Tours list and wait until the client is live (replay range set). */
async function openKestrel(page: Page): Promise<number> {
  await page.getByRole("link", { name: KESTREL }).first().click();
  await expect(page).toHaveURL(/\/tours\/\d+$/);
  await expect(page.getByTestId("workbench")).toBeVisible();
  await expect(page.getByTestId("caution-banner")).toBeVisible();
  await expect(page.getByTestId("timeline-play")).toBeEnabled();
  return Number(/\/tours\/(\d+)/.exec(page.url())![1]);
}

/** Wait for the worker to settle, then read the Δv total shown (km/s). */
async function settledTotal(page: Page): Promise<string> {
  await expect(page.getByTestId("budget-card")).not.toContainText("computing");
  return (await page.getByTestId("budget-total").textContent()) ?? "";
}

/** "YYYY-MM-DD HH:MM" (UTC) plus whole days, same format. */
function plusDays(text: string, d: number): string {
  const t = new Date(`${text.replace(" ", "T")}:00Z`).getTime() + d * 86400_000;
  return new Date(t).toISOString().slice(0, 16).replace("T", " ");
}

/** A digest of the Orrery's WebGL canvas: distinct colours on a grid, and a checksum of those pixels. */
async function canvasDigest(page: Page): Promise<{ colours: number; sum: number }> {
  return page.evaluate(() => {
    const canvas = document.querySelector('[data-testid="orrery"] canvas') as HTMLCanvasElement | null;
    if (!canvas || canvas.width === 0) return { colours: 0, sum: 0 };
    const c2 = document.createElement("canvas");
    c2.width = canvas.width;
    c2.height = canvas.height;
    const ctx = c2.getContext("2d")!;
    ctx.drawImage(canvas, 0, 0); // the Canvas keeps its drawing buffer (preserveDrawingBuffer)
    const { data } = ctx.getImageData(0, 0, c2.width, c2.height);
    const seen = new Set<number>();
    let sum = 0;
    for (let y = 0; y < c2.height; y += 3) {
      for (let x = 0; x < c2.width; x += 3) {
        const i = (y * c2.width + x) * 4;
        const v = (data[i]! << 16) | (data[i + 1]! << 8) | data[i + 2]!;
        seen.add(v);
        sum = (sum + v * (x + 1) * (y + 1)) % 2147483647;
      }
    }
    return { colours: seen.size, sum };
  });
}

const venusEpoch = (page: Page) => page.locator('[data-node-id="venus"]').getByTestId("epoch-input");

test.describe("Workbench", () => {
  test("designer: scene, replay, edit an epoch, undo/redo, save", async ({ page }) => {
    await signIn(page, "designer@alder.example");
    await openKestrel(page);
    await expect(page.getByTestId("chain-node")).toHaveCount(5);
    await expect(page.getByTestId("orrery")).toBeVisible();

    // The scene draws (not one flat colour).
    await expect.poll(async () => (await canvasDigest(page)).colours, { timeout: 15_000 }).toBeGreaterThan(3);
    const scene0 = await canvasDigest(page);

    // The replay clock moves the current date, and the spacecraft (and planets) move in the scene.
    const date0 = await page.getByTestId("timeline-date").textContent();
    await page.getByTestId("timeline-speed").selectOption("100");
    await page.getByTestId("timeline-play").click();
    await expect(page.getByTestId("timeline-date")).not.toHaveText(date0 ?? "", { timeout: 10_000 });
    await page.getByTestId("timeline-play").click(); // pause
    await expect(page.getByTestId("timeline-progress")).toContainText(/Leg \d of 4|Arrived/);
    await expect.poll(async () => (await canvasDigest(page)).sum, { timeout: 10_000 }).not.toBe(scene0.sum);
    await shot(page, "workbench-designer");

    // Edit the Venus flyby epoch: the Δv budget is recomputed in the worker.
    const version0 = Number(await page.getByTestId("tour-version").textContent());
    const total0 = await settledTotal(page);
    const before = await venusEpoch(page).inputValue();
    expect(before).toMatch(/^\d{4}-\d{2}-\d{2} \d{2}:\d{2}$/);
    const after = plusDays(before, 14);
    await venusEpoch(page).fill(after);
    await venusEpoch(page).press("Enter");
    await expect(page.getByTestId("unsaved")).toBeVisible();
    await expect.poll(() => settledTotal(page)).not.toBe(total0);
    const total1 = await settledTotal(page);
    await shot(page, "workbench-edited");

    // Undo and redo (buttons, then the keyboard).
    await page.getByRole("button", { name: /^Undo/ }).click();
    await expect(venusEpoch(page)).toHaveValue(before);
    await expect.poll(() => settledTotal(page)).toBe(total0);
    await expect(page.getByTestId("unsaved")).toHaveCount(0);
    await page.getByRole("button", { name: /^Redo/ }).click();
    await expect(venusEpoch(page)).toHaveValue(after);
    await page.locator("body").click({ position: { x: 5, y: 5 } });
    await page.keyboard.press("Control+z");
    await expect(venusEpoch(page)).toHaveValue(before);
    await page.keyboard.press("Control+Shift+z");
    await expect(venusEpoch(page)).toHaveValue(after);
    await expect.poll(() => settledTotal(page)).toBe(total1);

    // Save: the version goes up by one and the edit is there after a reload.
    await page.getByTestId("save-button").click();
    await expect(page.getByTestId("tour-version")).toHaveText(String(version0 + 1));
    await expect(page.getByTestId("unsaved")).toHaveCount(0);
    await page.reload();
    await expect(page.getByTestId("timeline-play")).toBeEnabled();
    await expect(venusEpoch(page)).toHaveValue(after);
    await expect(page.getByTestId("tour-version")).toHaveText(String(version0 + 1));
  });

  test("designer: add, reorder and remove a node keeps the chain consistent", async ({ page }) => {
    await signIn(page, "designer@alder.example");
    await openKestrel(page);
    const ids = () => page.getByTestId("chain-node").evaluateAll((els) => els.map((e) => e.getAttribute("data-node-id")));
    const before = await ids();
    await page.getByRole("button", { name: "Insert a node after #1" }).click();
    await expect(page.getByTestId("chain-node")).toHaveCount(before.length + 1);
    const added = (await ids())[1]!;
    expect(before).not.toContain(added);
    await page.getByRole("button", { name: /Move .* \(#2\) later/ }).click();
    expect((await ids())[2]).toBe(added);
    await page.getByRole("button", { name: /Remove .* \(#3\)/ }).click();
    expect(await ids()).toEqual(before);
    // Reordering keeps the calendar in place, so the chain is back but an epoch moved: still unsaved.
    await expect(page.getByTestId("unsaved")).toBeVisible();
    for (let k = 0; k < 3; k++) await page.getByRole("button", { name: /^Undo/ }).click();
    expect(await ids()).toEqual(before);
    await expect(page.getByTestId("unsaved")).toHaveCount(0);
    await expect(page.getByRole("button", { name: /^Undo/ })).toBeDisabled();
  });

  test("designer: a node's search window is edited in the Chain and undone", async ({ page }) => {
    await signIn(page, "designer@alder.example");
    await openKestrel(page);
    const venus = page.locator('[data-node-id="venus"]');
    await expect(venus.getByTestId("window-fields")).toBeVisible();
    const from0 = await venus.getByTestId("window-start").inputValue();
    await venus.getByTestId("window-start").fill(plusDays(from0, -10));
    await venus.getByTestId("window-start").press("Enter");
    await expect(page.getByTestId("unsaved")).toBeVisible();
    await expect(venus.getByTestId("window-start")).toHaveValue(plusDays(from0, -10));
    await venus.getByRole("button", { name: "Clear the search window" }).click();
    await expect(venus.getByTestId("window-fields")).toHaveCount(0);
    await expect(venus.getByTestId("window-add")).toBeVisible();
    for (let k = 0; k < 2; k++) await page.getByRole("button", { name: /^Undo/ }).click();
    await expect(venus.getByTestId("window-start")).toHaveValue(from0);
    await expect(page.getByTestId("unsaved")).toHaveCount(0);
  });

  test("designer: a stale save shows what changed and can load their version", async ({ page }) => {
    await signIn(page, "designer@alder.example");
    const id = await openKestrel(page);
    // Someone else saves first (same API the page uses).
    const current = await (await page.request.get(`/api/tours/${id}`)).json();
    const theirs = structuredClone(current.tour);
    theirs.nodes[2].epoch += 10 * 86400;
    const res = await page.request.patch(`/api/tours/${id}`, { data: { version: current.version, tour: theirs } });
    expect(res.status()).toBe(200);

    const jupiter = await page.locator('[data-node-id="jupiter"]').getByTestId("epoch-input").inputValue();
    await page.locator('[data-node-id="jupiter"]').getByTestId("epoch-input").fill(plusDays(jupiter, 12));
    await page.locator('[data-node-id="jupiter"]').getByTestId("epoch-input").press("Enter");
    await page.getByTestId("save-button").click();
    const dialog = page.getByTestId("conflict-dialog");
    await expect(dialog).toBeVisible();
    await expect(dialog.getByTestId("conflict-change").filter({ hasText: "epoch" })).toHaveCount(2);
    await expect(dialog).toContainText("Total Δv");
    await shot(page, "workbench-conflict");
    await expect(dialog.getByTestId("conflict-overwrite")).toBeVisible(); // the designer owns this tour
    await dialog.getByTestId("conflict-load-theirs").click();
    await expect(dialog).toHaveCount(0);
    await expect(page.getByTestId("tour-version")).toHaveText(String(current.version + 1));
    await expect(page.getByTestId("unsaved")).toHaveCount(0);
  });

  test("analyst edits only the flyby minimum radius", async ({ page }) => {
    await signIn(page, "analyst@alder.example");
    await openKestrel(page);
    await expect(page.getByTestId("rpmin-input").first()).toBeVisible();
    await expect(page.getByTestId("epoch-input")).toHaveCount(0);
    await expect(page.getByTestId("body-select")).toHaveCount(0);
    await expect(page.getByRole("link", { name: "Tour search" })).toHaveCount(0);
    const rp = page.getByTestId("rpmin-input").first();
    await rp.fill((await rp.inputValue()) === "6100" ? "6150" : "6100");
    await expect(page.getByTestId("unsaved")).toBeVisible();
    await page.getByTestId("save-button").click();
    await expect(page.getByTestId("unsaved")).toHaveCount(0);
    await expect(page.getByTestId("save-error")).toHaveCount(0);
    await shot(page, "workbench-analyst");
  });

  test("viewer replays and reads but sees no edit controls", async ({ page }) => {
    await signIn(page, "viewer@alder.example");
    await openKestrel(page);
    await expect(page.getByTestId("read-only-note")).toBeVisible();
    for (const testId of ["save-button", "epoch-input", "body-select", "rpmin-input", "arrival-kind"]) {
      await expect(page.getByTestId(testId)).toHaveCount(0);
    }
    await expect(page.getByRole("button", { name: /^Undo/ })).toHaveCount(0);
    await expect(page.getByRole("button", { name: /^Remove / })).toHaveCount(0);
    await expect(page.getByRole("button", { name: /^Insert a node/ })).toHaveCount(0);
    await expect(page.getByRole("link", { name: "Window scan" })).toHaveCount(0);
    // Replay still works.
    const date0 = await page.getByTestId("timeline-date").textContent();
    await page.getByTestId("timeline-jump").nth(2).click();
    await expect(page.getByTestId("timeline-date")).not.toHaveText(date0 ?? "");
    await expect(page.getByTestId("encounter-card")).toContainText("Earth");
    await page.getByTestId("timeline-play").click();
    await expect(page.getByTestId("timeline-play")).toHaveText(/Pause/);
    await shot(page, "workbench-viewer");
  });
});
