import { expect, test, type Page } from "@playwright/test";
import { shot, signIn } from "./helpers";

const KESTREL = "Kestrel — Jupiter via Venus and Earth";

/** Id of the Kestrel tour (from the Tours API of the signed-in team). */
async function kestrelId(page: Page): Promise<number> {
  const list = await page.evaluate(async () => (await fetch("/api/tours")).json());
  const t = (list.items as { id: number; name: string }[]).find((x) => x.name === KESTREL);
  expect(t, "the seeded Kestrel tour").toBeTruthy();
  return t!.id;
}

async function openAimBoard(page: Page, id: number): Promise<void> {
  await page.goto(`/tours/${id}/aim/venus`);
  await expect(page.getByTestId("caution-banner")).toBeVisible();
  await expect(page.getByTestId("bplane")).toBeVisible({ timeout: 30_000 });
  // Readouts are computed in the browser after mount.
  await expect(page.getByTestId("readout-bt")).not.toContainText("—", { timeout: 30_000 });
  await expect(page.getByTestId("readout-miss")).not.toContainText("—");
}

/** Distinct colours among a grid of pixels read back from the Orrery's WebGL canvas. */
async function canvasColours(page: Page): Promise<number> {
  return page.evaluate(() => {
    const canvas = document.querySelector('[data-testid="orrery"] canvas') as HTMLCanvasElement | null;
    if (!canvas || canvas.width === 0) return 0;
    const c2 = document.createElement("canvas");
    c2.width = canvas.width;
    c2.height = canvas.height;
    const ctx = c2.getContext("2d")!;
    ctx.drawImage(canvas, 0, 0); // works because the Canvas keeps its drawing buffer
    const seen = new Set<string>();
    for (let y = 2; y < c2.height; y += Math.max(1, Math.floor(c2.height / 60))) {
      for (let x = 2; x < c2.width; x += Math.max(1, Math.floor(c2.width / 60))) {
        const d = ctx.getImageData(x, y, 1, 1).data;
        seen.add(`${d[0]},${d[1]},${d[2]}`);
      }
    }
    return seen.size;
  });
}

test.describe("Aim board", () => {
  test.use({ viewport: { width: 1440, height: 1000 } });

  test("analyst drags the aim point: readouts and the miss change; the Orrery draws", async ({ page }) => {
    await signIn(page, "analyst@alder.example");
    const id = await kestrelId(page);
    await openAimBoard(page, id);
    await expect(page.getByRole("heading", { name: /Aim board · Venus flyby/ })).toBeVisible();
    await expect(page.getByTestId("save-aim")).toBeVisible();

    const bt0 = await page.getByTestId("readout-bt").textContent();
    const br0 = await page.getByTestId("readout-br").textContent();
    const miss0 = await page.getByTestId("readout-miss").textContent();
    await shot(page, "aim-board-before-drag");

    // Drag the handle with the mouse, in steps (pointer events).
    await page.getByTestId("bplane").scrollIntoViewIfNeeded();
    const h = (await page.getByTestId("aim-handle").boundingBox())!;
    const x0 = h.x + h.width / 2;
    const y0 = h.y + h.height / 2;
    await page.mouse.move(x0, y0);
    await page.mouse.down();
    for (let i = 1; i <= 12; i++) await page.mouse.move(x0 + 5 * i, y0 + 4 * i);
    await page.mouse.up();

    await expect(page.getByTestId("readout-bt")).not.toHaveText(bt0 ?? "");
    await expect(page.getByTestId("readout-br")).not.toHaveText(br0 ?? "");
    await expect(page.getByTestId("readout-miss")).not.toHaveText(miss0 ?? "");
    // Moving right and down in the plot raises B·T and B·R.
    const num = (s: string | null) => Number((s ?? "").replace(/[^\d.-]/g, ""));
    expect(num(await page.getByTestId("readout-bt").textContent())).toBeGreaterThan(num(bt0));
    expect(num(await page.getByTestId("readout-br").textContent())).toBeGreaterThan(num(br0));

    // Arrow keys move the focused handle (Shift: 10× the step).
    const bt1 = num(await page.getByTestId("readout-bt").textContent());
    await page.getByTestId("aim-handle").focus();
    await page.keyboard.press("Shift+ArrowLeft");
    await expect.poll(async () => num(await page.getByTestId("readout-bt").textContent())).toBeLessThan(bt1);

    // Back to the point the next leg needs: the miss at the next body is small again.
    await page.getByTestId("aim-reset-needed").click();
    await expect.poll(async () => num(await page.getByTestId("readout-miss").textContent())).toBeLessThan(1000);

    // The dispersion probabilities are shown with their method.
    await expect(page.getByTestId("p-below-min")).toBeVisible();
    await expect(page.getByText(/Method: bivariate normal/)).toBeVisible();

    // The Orrery's canvas has drawn something (not one flat colour).
    await expect(page.getByTestId("orrery").locator("canvas")).toBeVisible();
    await expect.poll(() => canvasColours(page), { timeout: 20_000 }).toBeGreaterThan(3);
    await shot(page, "aim-board-after-drag");
    await page.getByTestId("orrery").screenshot({ path: "test-results/screens/aim-board-orrery.png" });
  });

  test("viewer sees the board read-only; a launch node is not an Aim board", async ({ page }) => {
    await signIn(page, "viewer@alder.example");
    const id = await kestrelId(page);
    await openAimBoard(page, id);
    await expect(page.getByTestId("read-only-note")).toBeVisible();
    await expect(page.getByTestId("save-aim")).toHaveCount(0);
    const bt0 = await page.getByTestId("readout-bt").textContent();
    await page.getByTestId("bplane").scrollIntoViewIfNeeded();
    const h = (await page.getByTestId("aim-handle").boundingBox())!;
    await page.mouse.move(h.x + h.width / 2, h.y + h.height / 2);
    await page.mouse.down();
    await page.mouse.move(h.x + 80, h.y + 60, { steps: 5 });
    await page.mouse.up();
    await expect(page.getByTestId("readout-bt")).toHaveText(bt0 ?? "");
    await shot(page, "aim-board-viewer");

    // Only flybys have an Aim board: the launch node and unknown ids show the not-found screen
    // (the status may be 200: the workbench layout has begun streaming before the page decides).
    for (const node of ["launch", "no-such-node"]) {
      await page.goto(`/tours/${id}/aim/${node}`);
      await expect(page.getByRole("heading", { name: "No encounter here" })).toBeVisible();
      await expect(page.getByTestId("bplane")).toHaveCount(0);
    }
  });
});
