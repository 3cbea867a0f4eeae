import path from "node:path";
import { expect, test } from "@playwright/test";
import { signInAs } from "./fixtures";

test("purchasing imports a catalog, every lot gets a system or a reason, and picks one by hand", async ({
  page,
}, testInfo) => {
  await signInAs(page, "purchasing@marrowfinch.test");
  await page.getByTestId("main-nav").getByRole("link", { name: "Equipment" }).click();
  await expect(page.getByTestId("catalog-grid")).toContainText("ACF-24");
  await page
    .locator("#catalog-import-file")
    .setInputFiles(path.resolve(__dirname, "../../templates/example-equipment.csv"));
  await page.getByTestId("catalog-import").getByRole("button", { name: "Import" }).click();
  await expect(page.getByTestId("catalog-import-result")).toContainText("systems created");
  await expect(page.getByTestId("catalog-grid")).toContainText("AC24-F30");
  await expect(page.getByTestId("sizing-limits")).toContainText("Sizing limits");
  await expect(page.locator("#limit-coolingMaxPct")).toBeDisabled();

  // every lot of the demo community shows its system, or says none fits (and why, on hover)
  await page.getByTestId("main-nav").getByRole("link", { name: "Communities" }).click();
  await page.getByRole("link", { name: "Cedar Hollow" }).click();
  const { lots } = (await (await page.request.get("/api/communities/1/lots")).json()) as {
    lots: {
      id: number;
      systemCode: string | null;
      noFitReason: string | null;
      version: number;
      frozen: boolean;
    }[];
  };
  expect(lots.length).toBeGreaterThan(100);
  expect(lots.every((l) => l.systemCode || l.noFitReason)).toBe(true);
  const first = lots.find((l) => l.systemCode && !l.frozen)!;
  await expect(page.locator(`[row-id="${first.id}"] [col-id="equipment"]`)).toHaveText(first.systemCode!);

  // a purchaser picks another system by hand
  await page.locator(`[row-id="${first.id}"] [col-id="equipment"]`).dblclick();
  await page.keyboard.press("ArrowDown");
  await page.getByRole("option", { name: "ACF-48", exact: true }).click();
  await expect(page.getByTestId("lots-notice")).toContainText("System set by hand");
  await expect(page.locator(`[row-id="${first.id}"] [col-id="equipment"]`)).toHaveText("ACF-48 (by hand)");
  await expect(page.locator(`[row-id="${first.id}"] [col-id="equipment"]`)).toHaveClass(/cell-error/);
  await page.screenshot({ path: testInfo.outputPath("lots-with-systems.png"), fullPage: true });
});
