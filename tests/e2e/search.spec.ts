import { expect, test, type Page } from "@playwright/test";
import { shot, signIn } from "./helpers";
import { tdbSecondsToIso } from "../../lib/astro/time";

const PETREL = "Petrel — Saturn tour study";

/** Open the Petrel tour from the Tours list; returns its id. */
async function openPetrel(page: Page): Promise<number> {
  await page.getByRole("link", { name: PETREL }).first().click();
  await expect(page).toHaveURL(/\/tours\/\d+$/);
  return Number(/\/tours\/(\d+)/.exec(page.url())![1]);
}

const numberIn = async (page: Page, testId: string) => Number(((await page.getByTestId(testId).textContent()) ?? "").replace(/[^\d.]/g, ""));

test.describe("Window scan and Tour search", () => {
  test("designer: scan a leg, read the contours, adopt a cell", async ({ page }) => {
    await signIn(page, "designer@alder.example");
    const id = await openPetrel(page);
    await page.goto(`/tours/${id}/scan`);
    await expect(page.getByTestId("caution-banner")).toBeVisible();
    await page.getByTestId("run-scan").click();
    await expect(page.getByTestId("contour-plot")).toBeVisible({ timeout: 60_000 });
    await expect(page.getByTestId("scan-minimum")).toBeVisible();
    await expect(page.getByTestId("run-progress")).toContainText(/cells/);
    // hover: the readout follows the cursor
    const box = (await page.getByTestId("contour-hit").boundingBox())!;
    await page.mouse.move(box.x + box.width * 0.3, box.y + box.height * 0.6);
    await expect(page.getByTestId("scan-readout")).toContainText("Under the cursor");
    await expect(page.getByTestId("readout-c3")).toContainText("km²/s²");
    // pick a cell and adopt it: the server's numbers come back with a new version
    await page.mouse.click(box.x + box.width * 0.5, box.y + box.height * 0.5);
    await page.getByTestId("adopt-cell").click();
    await expect(page.getByTestId("adopt-panel")).toContainText("Saved as version", { timeout: 15_000 });
    await shot(page, "scan-designer");
  });

  test("designer: search runs with progress, cancels within a second, adopting a candidate changes the tour", async ({ page }) => {
    await signIn(page, "designer@alder.example");
    const id = await openPetrel(page);
    await page.goto(`/tours/${id}/search`);
    await expect(page.getByTestId("caution-banner")).toBeVisible();

    // A long run: progress moves, then cancel stops it at once with the best so far.
    await page.getByTestId("search-budget").fill("20000000");
    await page.getByTestId("run-search").click();
    await expect(page.getByTestId("cancel-run")).toBeVisible();
    await expect.poll(() => numberIn(page, "progress-done"), { timeout: 30_000 }).toBeGreaterThan(0);
    const first = await numberIn(page, "progress-done");
    await expect.poll(() => numberIn(page, "progress-done"), { timeout: 30_000 }).toBeGreaterThan(first);
    await page.getByTestId("cancel-run").click();
    const t0 = Date.now();
    await expect(page.getByTestId("cancel-run")).toHaveCount(0, { timeout: 1_000 });
    expect(Date.now() - t0).toBeLessThan(1_000);
    await expect(page.getByText(/cancelled, best so far/)).toBeVisible();
    const stopped = await numberIn(page, "progress-done");
    await page.waitForTimeout(700);
    expect(await numberIn(page, "progress-done")).toBe(stopped);

    // A short run to the end, then adopt the best candidate.
    await page.getByTestId("search-budget").fill("30000");
    await page.getByTestId("run-search").click();
    await expect(page.getByTestId("candidate-row").first()).toBeVisible({ timeout: 90_000 });
    await expect(page.getByTestId("convergence-plot")).toBeVisible();
    await shot(page, "search-designer");
    await page.getByTestId("adopt-candidate").first().click();
    await expect(page.getByTestId("adopt-panel")).toContainText("Saved as version", { timeout: 15_000 });
    const adoptedDv = (await page.getByTestId("adopted-total-dv").textContent()) ?? "";
    const candidateDv = (await page.getByTestId("candidate-row").first().locator("td").nth(6).textContent()) ?? "";
    expect(adoptedDv.replace(/\s/g, "")).toBe(candidateDv.replace(/\s/g, ""));

    // The stored tour now carries the candidate's epochs and the server's numbers match.
    const launch = ((await page.getByTestId("candidate-row").first().locator("td").nth(2).textContent()) ?? "").trim();
    const stored = (await (await page.request.get(`/api/tours/${id}`)).json()) as { tour: { nodes: { epoch: number }[] }; result: { totalDv: number } };
    expect(tdbSecondsToIso(stored.tour.nodes[0]!.epoch).slice(0, 10)).toBe(launch);
    expect(stored.result.totalDv.toFixed(3)).toBe(adoptedDv.replace(/[^\d.]/g, ""));
  });

  test("viewer: sees the screens but cannot run or adopt", async ({ page }) => {
    await signIn(page, "viewer@alder.example");
    const id = await openPetrel(page);
    await page.goto(`/tours/${id}/search`);
    await expect(page.getByTestId("caution-banner")).toBeVisible();
    await expect(page.getByTestId("run-search")).toHaveCount(0);
    await expect(page.getByText("Only a lead or a designer can run searches")).toBeVisible();
    await page.goto(`/tours/${id}/scan`);
    await expect(page.getByTestId("run-scan")).toHaveCount(0);
  });
});
