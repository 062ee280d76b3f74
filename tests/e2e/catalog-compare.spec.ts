import { expect, test } from "@playwright/test";
import { shot, signIn } from "./helpers";

const HEADER = "name,epoch_utc,a_au,e,i_deg,raan_deg,argp_deg,m_deg,mu_km3_s2,radius_km,min_alt_km";

test.describe("Catalog", () => {
  test("a CSV with one bad row is rejected with its line number; a good one adds bodies to the list", async ({ page }) => {
    const tag = Date.now().toString(36);
    await signIn(page, "designer@alder.example");
    await page.goto("/catalog");
    await expect(page.getByTestId("caution-banner")).toBeVisible();
    await expect(page.getByText("custom:aldra", { exact: true })).toBeVisible();
    await page.getByRole("button", { name: "Upload CSV" }).click();

    const bad = [
      HEADER,
      `Quill ${tag} (invented),2031-01-01T00:00:00Z,1.7,0.1,2,10,20,30,0.2,3,10`,
      `Rook ${tag} (invented),2031-01-01T00:00:00Z,1.9,1.4,2,10,20,30,0.2,3,10`,
    ].join("\n");
    await page.getByLabel("Bodies CSV file").setInputFiles({ name: "bad.csv", mimeType: "text/csv", buffer: Buffer.from(bad) });
    await page.getByRole("button", { name: "Import file" }).click();
    const alert = page.getByRole("alert").filter({ hasText: "Nothing was imported" });
    await expect(alert).toBeVisible();
    await expect(alert.getByRole("listitem")).toHaveCount(1);
    await expect(alert).toContainText("Line 3:");
    await expect(alert).toContainText("e must be < 1");
    await expect(page.getByText(`Quill ${tag} (invented)`)).toHaveCount(0);
    await shot(page, "catalog-upload-rejected");

    const good = [
      HEADER,
      `Quill ${tag} (invented),2031-01-01T00:00:00Z,1.7,0.1,2,10,20,30,0.2,3,10`,
      `Rook ${tag} (invented),2031-01-01T00:00:00Z,1.9,0.4,2,10,20,30,0.2,3,10`,
    ].join("\n");
    await page.getByLabel("Bodies CSV file").setInputFiles({ name: "good.csv", mimeType: "text/csv", buffer: Buffer.from(good) });
    await page.getByRole("button", { name: "Import file" }).click();
    await expect(page.getByRole("status").filter({ hasText: "Imported 2 bodies" }).first()).toBeVisible();
    const table = page.getByRole("table", { name: "Team small bodies" });
    await expect(table.getByText(`Quill ${tag} (invented)`)).toBeVisible();
    await expect(table.getByText(`custom:rook-${tag}-invented`)).toBeVisible();
    await shot(page, "catalog-upload-imported");
  });

  test("a viewer reads the catalog but sees no editing controls", async ({ page }) => {
    await signIn(page, "viewer@alder.example");
    await page.goto("/catalog");
    await expect(page.getByRole("heading", { name: "Planets" })).toBeVisible();
    await expect(page.getByText("custom:corvin")).toBeVisible();
    await expect(page.getByRole("button", { name: "Add body" })).toHaveCount(0);
    await expect(page.getByRole("button", { name: "Upload CSV" })).toHaveCount(0);
  });
});

test.describe("Compare", () => {
  test("a lead picks two seeded tours on Tours and compares them side by side", async ({ page }) => {
    await signIn(page, "lead@alder.example");
    const a = "Wren — Mars rendezvous, 2028 window";
    const b = "Kestrel — Jupiter via Venus and Earth";
    await page.getByLabel(`Select ${a} for Compare`).check();
    await page.getByLabel(`Select ${b} for Compare`).check();
    await page.getByRole("link", { name: /Compare \(2\)/ }).click();
    await expect(page).toHaveURL(/\/compare\?ids=\d+,\d+$/);
    const table = page.getByRole("table", { name: "Tour metrics side by side" });
    await expect(table.getByRole("link", { name: a, exact: true })).toBeVisible();
    await expect(table.getByRole("link", { name: b, exact: true })).toBeVisible();
    await expect(page.getByTestId("caution-banner")).toBeVisible();
    await expect(table.locator('[data-metric="c3"] [data-best="true"]')).toHaveCount(1);
    await expect(page.getByRole("img", { name: /Δv budget per tour/ })).toBeVisible();
    await expect(page.getByRole("img", { name: /Tour timelines/ })).toBeVisible();
    await expect(page.getByRole("link", { name: `${b}: trajectory OEM, 1-day step` })).toHaveAttribute("href", /format=oem&step=1/);
    await shot(page, "compare-two-tours");

    // The URL is the shareable state; a bad one explains what to do.
    await page.goto("/compare?ids=1");
    await expect(page.getByText("Compare takes 2–6 tours")).toBeVisible();
    await expect(page.getByRole("link", { name: "Pick tours on Tours" })).toBeVisible();
    await shot(page, "compare-invalid");
  });
});
