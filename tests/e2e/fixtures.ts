import { expect, type Page } from "@playwright/test";
import { DEMO_PASSWORD } from "@/db/demo-scenario";

/** Page object for signing in and out. */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
}

export async function signInAs(page: Page, email: string) {
  await signIn(page, email);
  await expect(page.getByTestId("main-nav")).toBeVisible();
}

export async function signOut(page: Page) {
  await page.goto("/sign-out");
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page).toHaveURL(/sign-in/);
}
