/**
 * The team lead's journey across screens: a designer saves two new tours from the Workbench and
 * submits them for review there; the lead compares them side by side, returns one with a comment
 * and baselines the other; the e-mails reach the Outbox. Uses tours it creates itself.
 */
import { expect, test, type Page } from "@playwright/test";
import { shot, signIn } from "./helpers";

async function createTour(page: Page, name: string): Promise<number> {
  await page.goto("/tours");
  await page.getByRole("button", { name: "New tour" }).click();
  await page.getByLabel("Tour name").fill(name);
  await page.getByRole("button", { name: "Create" }).click();
  await expect(page).toHaveURL(/\/tours\/\d+$/);
  await expect(page.getByTestId("timeline-play")).toBeEnabled();
  return Number(/\/tours\/(\d+)/.exec(page.url())![1]);
}

async function review(page: Page, action: string, comment?: string): Promise<void> {
  const panel = page.locator('[data-testid="review-panel"][data-ready="true"]');
  await expect(panel).toBeVisible();
  if (comment) await panel.getByLabel("Review comment").fill(comment);
  await panel.getByRole("button", { name: action }).click();
}

test("designer saves and submits two tours; the lead compares, returns one and baselines the other", async ({ page, browser }) => {
  await signIn(page, "designer@alder.example");
  const a = await createTour(page, "Journey A — Mars, early launch");
  // Move the arrival a week later and save: a new version, evaluated by the server.
  const arrival = page.locator('[data-node-id="n2"]').getByTestId("epoch-input");
  const before = await arrival.inputValue();
  const later = new Date(new Date(`${before.replace(" ", "T")}:00Z`).getTime() + 7 * 86400_000).toISOString().slice(0, 16).replace("T", " ");
  await arrival.fill(later);
  await arrival.press("Enter");
  await expect(page.getByTestId("unsaved")).toBeVisible();
  await page.getByTestId("save-button").click();
  await expect(page.getByTestId("tour-version")).toHaveText("2");
  await review(page, "Submit for review");
  await expect(page.getByTestId("review-panel")).toContainText(/submitted for review/);

  const b = await createTour(page, "Journey B — Mars, baseline candidate");
  await review(page, "Submit for review", "Ready for a decision.");
  await expect(page.getByTestId("review-panel")).toContainText(/submitted for review/);

  const lead = await (await browser.newContext()).newPage();
  await signIn(lead, "lead@alder.example");
  await lead.getByLabel("Select Journey A — Mars, early launch for Compare").check();
  await lead.getByLabel("Select Journey B — Mars, baseline candidate for Compare").check();
  await lead.getByRole("link", { name: /Compare \(2\)/ }).click();
  await expect(lead).toHaveURL(new RegExp(`/compare\\?ids=(${a},${b}|${b},${a})`));
  await expect(lead.getByText("Journey A — Mars, early launch").first()).toBeVisible();
  await expect(lead.getByText("Journey B — Mars, baseline candidate").first()).toBeVisible();
  await expect(lead.getByTestId("caution-banner").first()).toBeVisible();
  // Both tours in one Orrery on one replay clock.
  await expect(lead.getByTestId("orrery").locator("canvas")).toBeVisible();
  const d0 = await lead.getByTestId("compare-date").textContent();
  await lead.getByTestId("compare-play").click();
  await expect(lead.getByTestId("compare-date")).not.toHaveText(d0 ?? "", { timeout: 10_000 });
  await lead.getByTestId("compare-play").click();
  await shot(lead, "journey-compare");

  await lead.goto(`/tours/${a}`);
  await review(lead, "Return to designer", "Arrival v∞ too high for the capture stage; move the launch.");
  await expect(lead.getByTestId("review-panel")).toContainText(/returned/);
  await lead.goto(`/tours/${b}`);
  await review(lead, "Baseline");
  await expect(lead.getByTestId("review-panel")).toContainText(/baselined/);
  // A baselined tour is read-only in the Workbench.
  await lead.reload();
  await expect(lead.getByTestId("read-only-note")).toContainText(/Baselined/);
  await expect(lead.getByTestId("save-button")).toHaveCount(0);

  await lead.goto("/outbox");
  const mail = lead.getByTestId("outbox-message");
  await expect(mail.filter({ hasText: "Journey A — Mars, early launch was returned" })).toHaveCount(1);
  await expect(mail.filter({ hasText: "Journey B — Mars, baseline candidate was baselined" })).toHaveCount(1);
  await shot(lead, "journey-outbox");
});
