import { expect, test } from "@playwright/test";
import { signInAs, signOut } from "./fixtures";

test("an admin switches the load procedure; the lots follow; another role only sees it", async ({ page }) => {
  await signInAs(page, "admin@marrowfinch.test");
  await page.getByTestId("main-nav").getByRole("link", { name: "Account" }).click();
  const panel = page.getByTestId("load-procedure");
  await expect(panel.getByTestId("procedure-in-use")).toContainText(
    "Handbook residential load-factor procedure",
  );
  await panel.getByLabel(/Hourly design day/).check();
  await panel.getByRole("button", { name: "Use this procedure and recompute lots" }).click();
  await expect(panel.getByTestId("procedure-notice")).toContainText("lots recomputed by the new procedure");
  await expect(panel.getByTestId("procedure-in-use")).toContainText("Hourly design day");
  await expect(page.getByTestId("caution")).toBeVisible();

  await page.getByTestId("main-nav").getByRole("link", { name: "Plans" }).click();
  await expect(page.getByTestId("library-procedure")).toContainText("Hourly with heat storage");
  await signOut(page);

  await signInAs(page, "viewer@marrowfinch.test");
  await page.goto("/account");
  await expect(page.getByTestId("procedure-in-use")).toContainText("Hourly design day");
  await expect(page.getByRole("radio")).toHaveCount(0);
  await signOut(page);

  // Back to the default for the other tests.
  await signInAs(page, "admin@marrowfinch.test");
  await page.goto("/account");
  await page
    .getByTestId("load-procedure")
    .getByLabel(/Handbook residential load-factor/)
    .check();
  await page.getByRole("button", { name: "Use this procedure and recompute lots" }).click();
  await expect(page.getByTestId("procedure-in-use")).toContainText(
    "Handbook residential load-factor procedure",
  );
});
