import { expect, type Page } from "@playwright/test";
import fs from "node:fs";

export const PASSWORD = "e2e-password-123";

export async function signIn(page: Page, email: string, password = PASSWORD): Promise<void> {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/tours/);
}

/** Save a full-page screenshot under test-results/screens/ (kept as CI output). */
export async function shot(page: Page, name: string): Promise<void> {
  fs.mkdirSync("test-results/screens", { recursive: true });
  await page.screenshot({ path: `test-results/screens/${name}.png`, fullPage: true });
}
