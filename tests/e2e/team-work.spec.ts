/**
 * Team work end to end: a lead invites a member who joins from the Outbox link; a designer
 * submits a tour; the lead returns one with a comment and baselines another; the e-mails show
 * up in the Outbox; History shows the revisions and their diff.
 * The tours it moves are put back in their seeded status at the end (Kestrel in review, Skua returned).
 */
import { expect, test, type Page } from "@playwright/test";
import { PASSWORD, shot, signIn } from "./helpers";

async function tourId(page: Page, name: string): Promise<number> {
  const list = await (await page.request.get(`/api/tours?q=${encodeURIComponent(name.split(" ")[0]!)}`)).json();
  const t = list.items.find((x: { name: string }) => x.name === name);
  expect(t, `tour ${name}`).toBeTruthy();
  return t.id as number;
}

/** Wait until a panel has hydrated (it sets data-ready), so clicks reach React, not a native form submit. */
async function ready(page: Page, testId: string): Promise<void> {
  await expect(page.locator(`[data-testid="${testId}"][data-ready="true"]`)).toBeVisible();
}

const SKUA = "Skua — Aldra flyby via Mars";
const KESTREL = "Kestrel — Jupiter via Venus and Earth";

test.describe("team work", () => {
  test("a lead invites a member, who opens the link from the Outbox, sets a password and signs in", async ({ page, browser }) => {
    await signIn(page, "lead@alder.example");
    await page.goto("/team");
    await ready(page, "team-manager");
    await page.getByLabel("E-mail").fill("quinn@alder.example");
    await page.getByLabel("Role", { exact: true }).selectOption("analyst");
    await page.getByRole("button", { name: "Send invitation" }).click();
    await expect(page.getByText("Invitation sent to quinn@alder.example")).toBeVisible();
    await expect(page.getByTestId("invitation-row").filter({ hasText: "quinn@alder.example" })).toContainText("Pending");
    await shot(page, "team-invited");

    await page.goto("/outbox");
    const message = page.getByTestId("outbox-message").filter({ hasText: "invited you to Alder Flight Studio" }).first();
    await message.locator("summary").click();
    const text = await message.locator("pre").innerText();
    const path = /\/invite\/[A-Za-z0-9_-]{43}/.exec(text)?.[0];
    expect(path, "invitation link in the e-mail").toBeTruthy();

    const invitee = await (await browser.newContext()).newPage();
    await invitee.goto(path!);
    await expect(invitee.getByRole("heading", { name: "Join Alder Flight Studio" })).toBeVisible();
    await ready(invitee, "invite-form");
    await invitee.getByLabel("Name").fill("Quinn Tamsin");
    await invitee.getByLabel("Password", { exact: true }).fill("quinn-password-42");
    await invitee.getByLabel("Confirm password").fill("quinn-password-4");
    await invitee.getByRole("button", { name: "Join team" }).click();
    await expect(invitee.getByText("The two passwords differ.")).toBeVisible();
    await invitee.getByLabel("Confirm password").fill("quinn-password-42");
    await shot(invitee, "invite-form");
    await invitee.getByRole("button", { name: "Join team" }).click();
    await expect(invitee).toHaveURL(/\/tours/);
    await expect(invitee.getByTestId("user-menu").getByText("Quinn Tamsin", { exact: true })).toBeVisible();

    // The link works once.
    await invitee.goto(path!);
    await expect(invitee.getByRole("heading", { name: "This invitation was already used" })).toBeVisible();
    await shot(invitee, "invite-used");

    // The new password signs in from a fresh browser.
    const fresh = await (await browser.newContext()).newPage();
    await signIn(fresh, "quinn@alder.example", "quinn-password-42");
    await expect(fresh.getByTestId("user-menu").getByText("Quinn Tamsin", { exact: true })).toBeVisible();

    await page.goto("/team");
    await expect(page.getByTestId("member-row").filter({ hasText: "quinn@alder.example" })).toBeVisible();
    await expect(page.getByTestId("audit-row").filter({ hasText: "joined the team by invitation" }).first()).toBeVisible();
  });

  test("a designer submits; the lead returns one with a comment and baselines another; e-mails reach the Outbox", async ({ page, browser }) => {
    await signIn(page, "designer@alder.example");
    const skua = await tourId(page, SKUA);
    const kestrel = await tourId(page, KESTREL);

    await page.goto(`/tours/${skua}/discussion`);
    await ready(page, "review-panel");
    await expect(page.getByTestId("caution-banner").first()).toBeVisible();
    const review = page.getByTestId("review-panel");
    await expect(review.getByRole("button", { name: "Baseline" })).toHaveCount(0);
    await review.getByLabel("Review comment").fill("Mars pass reworked; ready again.");
    await review.getByRole("button", { name: "Submit for review" }).click();
    await expect(review.getByText(/Tour submitted for review\. E-mailed lead@alder\.example/)).toBeVisible();
    await expect(review.getByText("In review")).toBeVisible();
    await shot(page, "discussion-submitted");

    const lead = await (await browser.newContext()).newPage();
    await signIn(lead, "lead@alder.example");
    await lead.goto(`/tours/${skua}/discussion`);
    await ready(lead, "review-panel");
    const leadReview = lead.getByTestId("review-panel");
    await leadReview.getByRole("button", { name: "Return to designer" }).click();
    await expect(leadReview.getByText(/A comment is required to return/)).toBeVisible();
    await leadReview.getByLabel("Review comment").fill("Aldra arrival v∞ is too high; try a later Mars date.");
    await leadReview.getByRole("button", { name: "Return to designer" }).click();
    await expect(leadReview.getByText(/Tour returned\. E-mailed designer@alder\.example/)).toBeVisible();
    await expect(lead.getByTestId("comment").filter({ hasText: "Returned: Aldra arrival v∞ is too high" })).toBeVisible();
    await shot(lead, "discussion-returned");

    await lead.goto(`/tours/${kestrel}/discussion`);
    await ready(lead, "review-panel");
    await leadReview.getByRole("button", { name: "Baseline" }).click();
    await expect(leadReview.getByText(/Tour baselined\./)).toBeVisible();
    await expect(leadReview.getByText("Baselined", { exact: true })).toBeVisible();

    await lead.goto("/outbox");
    const subjects = lead.getByTestId("outbox-message");
    await expect(subjects.filter({ hasText: `Review requested: ${SKUA}` })).toHaveCount(1);
    await expect(subjects.filter({ hasText: `${SKUA} was returned` })).toHaveCount(1);
    await expect(subjects.filter({ hasText: `${KESTREL} was baselined` })).toHaveCount(1);
    await shot(lead, "outbox-review");

    await lead.goto(`/tours/${kestrel}/history`);
    await ready(lead, "history-panel");
    await expect(lead.getByTestId("revision-row").first()).toContainText("baselined");
    await expect(lead.getByTestId("revision-diff")).toContainText("Status: in review → baselined");
    await expect(lead.getByRole("button", { name: /^Restore/ })).toHaveCount(0); // baselined: read-only
    await shot(lead, "history-baselined");

    // Put Kestrel back in review for the specs that follow: reopen (comment required), submit.
    await lead.goto(`/tours/${kestrel}/discussion`);
    await ready(lead, "review-panel");
    await leadReview.getByLabel("Review comment").fill("Reopened after the end-to-end check.");
    await leadReview.getByRole("button", { name: "Reopen as draft" }).click();
    await expect(leadReview.getByText(/Tour reopened\./)).toBeVisible();
    await leadReview.getByRole("button", { name: "Submit for review" }).click();
    await expect(leadReview.getByText(/Tour submitted for review\./)).toBeVisible();
    expect((await (await lead.request.get(`/api/tours/${kestrel}`)).json()).status).toBe("in_review");
  });

  test("viewers read the discussion and history but cannot act", async ({ page }) => {
    await signIn(page, "viewer@alder.example", PASSWORD);
    const skua = await tourId(page, SKUA);
    await page.goto(`/tours/${skua}/discussion`);
    await ready(page, "comments-panel");
    await expect(page.getByTestId("comment").first()).toBeVisible();
    await expect(page.getByRole("button", { name: "Post comment" })).toHaveCount(0);
    await expect(page.getByRole("button", { name: "Submit for review" })).toHaveCount(0);
    const res = await page.request.post(`/api/tours/${skua}/comments`, { data: { body: "hello" } });
    expect(res.status()).toBe(403);
    await page.goto(`/tours/${skua}/history`);
    await expect(page.getByTestId("revision-row").first()).toBeVisible();
    await expect(page.getByRole("button", { name: /^Restore/ })).toHaveCount(0);
  });
});
