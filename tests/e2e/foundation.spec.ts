import { expect, test } from "@playwright/test";
import { PASSWORD, shot, signIn } from "./helpers";

test.describe("public pages", () => {
  test("landing says what Gybe is for and links to sign-in", async ({ page }) => {
    await page.goto("/");
    await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
    await expect(page.getByText(/patched-conic/i).first()).toBeVisible();
    await shot(page, "landing");
    await page.getByRole("link", { name: /sign in/i }).first().click();
    await expect(page).toHaveURL(/\/sign-in/);
    await shot(page, "sign-in");
  });

  test("signed-out visitors are sent to sign-in", async ({ page }) => {
    await page.goto("/tours");
    await expect(page).toHaveURL(/\/sign-in/);
  });
});

test.describe("sign-in", () => {
  test("a wrong password shows a message", async ({ page }) => {
    await page.goto("/sign-in");
    await page.getByLabel("E-mail").fill("designer@alder.example");
    await page.getByLabel("Password").fill("not-the-password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page.getByText(/do not match/i)).toBeVisible();
    await expect(page).toHaveURL(/\/sign-in/);
  });

  test("the sixth try is locked, even with the right password", async ({ page }) => {
    await page.goto("/sign-in");
    for (let i = 0; i < 5; i++) {
      await page.getByLabel("E-mail").fill("lockout@alder.example");
      await page.getByLabel("Password").fill(`wrong-${i}`);
      await page.getByRole("button", { name: "Sign in" }).click();
      await expect(page.getByText(/do not match/i)).toBeVisible();
    }
    await page.getByLabel("Password").fill(PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page.getByText(/too many failed sign-ins/i)).toBeVisible();
    await shot(page, "sign-in-locked");
  });
});

test.describe("roles", () => {
  test("lead sees Team and Outbox and can create tours", async ({ page }) => {
    await signIn(page, "lead@alder.example");
    const nav = page.getByRole("navigation", { name: "Main" });
    await expect(nav.getByRole("link", { name: "Team" })).toBeVisible();
    await expect(nav.getByRole("link", { name: "Outbox" })).toBeVisible();
    await expect(page.getByRole("button", { name: "New tour" })).toBeVisible();
    await expect(page.getByText("Kestrel — Jupiter via Venus and Earth")).toBeVisible();
    await shot(page, "tours-lead");
    await nav.getByRole("link", { name: "Team" }).click();
    await expect(page.getByTestId("member-row")).toHaveCount(5);
    await shot(page, "team");
    await nav.getByRole("link", { name: "Outbox" }).click();
    await expect(page.getByTestId("outbox-message").first()).toContainText("Welcome to Gybe");
    await shot(page, "outbox");
  });

  test("designer creates a tour and lands in its Workbench", async ({ page }) => {
    await signIn(page, "designer@alder.example");
    const nav = page.getByRole("navigation", { name: "Main" });
    await expect(nav.getByRole("link", { name: "Team" })).toHaveCount(0);
    await page.getByRole("button", { name: "New tour" }).click();
    await page.getByLabel("Tour name").fill("E2E starter");
    await page.getByRole("button", { name: "Create" }).click();
    await expect(page).toHaveURL(/\/tours\/\d+$/);
    await expect(page.getByRole("heading", { name: "E2E starter" })).toBeVisible();
    await expect(page.getByTestId("caution-banner").first()).toBeVisible();
    await shot(page, "workbench-new");
  });

  test("analyst reads tours but cannot create them", async ({ page }) => {
    await signIn(page, "analyst@alder.example");
    await expect(page.getByText("Kestrel — Jupiter via Venus and Earth")).toBeVisible();
    await expect(page.getByRole("button", { name: "New tour" })).toHaveCount(0);
    await page.goto("/outbox");
    await expect(page).toHaveURL(/\/tours\?denied=1/);
  });

  test("viewer: no create button, and the API answers 403", async ({ page }) => {
    await signIn(page, "viewer@alder.example");
    await expect(page.getByRole("button", { name: "New tour" })).toHaveCount(0);
    const res = await page.request.post("/api/tours", { data: { name: "Sneaky" } });
    expect(res.status()).toBe(403);
    expect((await res.json()).error).toBe("forbidden");
    await shot(page, "tours-viewer");
  });

  test("another team's tour answers 404", async ({ page }) => {
    await signIn(page, "lead@birch.example");
    const list = await (await page.request.get("/api/tours")).json();
    expect(list.items.map((t: { name: string }) => t.name)).toEqual(["Birch private tour"]);
    await page.context().clearCookies();
    await signIn(page, "lead@alder.example");
    const mine = await (await page.request.get("/api/tours?sort=name&dir=asc")).json();
    const maxId = Math.max(...mine.items.map((t: { id: number }) => t.id));
    // Birch's tour was created after Alder's, so its id is above every Alder id.
    const birchId = maxId + 1;
    expect((await page.request.get(`/api/tours/${birchId}`)).status()).toBe(404);
    // The page streams (it has a loading state), so the status line is already sent; what the
    // reader gets is the not-found screen, never the other team's tour.
    await page.goto(`/tours/${birchId}`);
    await expect(page.getByRole("heading", { name: /no encounter here/i })).toBeVisible();
    await expect(page.getByText("Birch private tour")).toHaveCount(0);
    await shot(page, "not-found");
  });

  test("sign-out returns to sign-in", async ({ page }) => {
    await signIn(page, "viewer@alder.example");
    await page.getByRole("button", { name: "Sign out" }).click();
    await expect(page).toHaveURL(/\/sign-in/);
  });
});
