import path from "node:path";
import { expect, test, type Page } from "@playwright/test";
import { signInAs, signOut } from "./fixtures";

interface ApiPlan {
  id: number;
  planCode: string;
  version: number;
  cells: Record<string, unknown>;
  loads: { facings: { label: string; coolingTotalBtuh: number; heatingBtuh: number }[] };
}

async function plansFromApi(page: Page): Promise<ApiPlan[]> {
  return ((await (await page.request.get("/api/plans")).json()) as { plans: ApiPlan[] }).plans;
}

const cell = (page: Page, planId: number, colId: string) =>
  page.locator(`[row-id="${planId}"] [col-id="${colId}"]`).first();

/** Brings a column of the wide grid into view with the grid's own "Go to column" control. */
async function goToColumn(page: Page, key: string) {
  await page.locator("#jump-column").selectOption(key);
}

test("a designer imports the template, edits with a formula, bulk-raises insulation, pastes a block; a reviewer approves", async ({
  page,
}, testInfo) => {
  // A long scenario on a shared machine: room for slow steps, not a measure of speed (that is npm run bench).
  test.setTimeout(180_000);
  await signInAs(page, "designer@marrowfinch.test");
  await expect(page.getByTestId("plan-grid")).toBeVisible();

  // import the template from templates/
  await page
    .locator("#plan-import-file")
    .setInputFiles(path.resolve(__dirname, "../../templates/plan-library-template.csv"));
  await page.getByTestId("plan-import").getByRole("button", { name: "Import" }).click();
  await expect(page.getByTestId("plan-import-result")).toContainText("1 created");

  // a formula in a cell: the facing loads change
  let plans = await plansFromApi(page);
  const aster = plans.find((p) => p.planCode === "AS-1450")!;
  await page.getByTestId("toggle-facings").check();
  const coolBefore = await cell(page, aster.id, "cool_W").innerText();
  await goToColumn(page, "back_window_ft2");
  await cell(page, aster.id, "back_window_ft2").dblclick();
  await page.keyboard.press("ControlOrMeta+a");
  await page.keyboard.type("=back_wall_ft2*0.3");
  await page.keyboard.press("Enter");
  await expect(page.getByTestId("grid-notice")).toContainText("Saved 1 plan model");
  await expect(cell(page, aster.id, "back_window_ft2")).toHaveText("111");
  await expect(cell(page, aster.id, "cool_W")).not.toHaveText(coolBefore);

  // a bad formula is an error on that cell, never a silent 0
  await goToColumn(page, "left_window_ft2");
  await cell(page, aster.id, "left_window_ft2").dblclick();
  await page.keyboard.press("ControlOrMeta+a");
  await page.keyboard.type("=left_wall_ft2*/2");
  await page.keyboard.press("Enter");
  await expect(page.getByTestId("grid-error")).toBeVisible();
  await expect(cell(page, aster.id, "left_window_ft2")).toHaveClass(/cell-error/);

  // bulk: raise ceiling insulation on three models
  plans = await plansFromApi(page);
  const three = plans.filter((p) => ["AS-1450", "BR-1820", "CO-2360"].includes(p.planCode));
  for (const p of three)
    await page.locator(`[row-id="${p.id}"] .ag-selection-checkbox input`).first().check();
  await page.locator("#bulk-column").selectOption("ceiling_cavity_r");
  await page.locator("#bulk-value").fill("R-49");
  await page.getByTestId("bulk-edit").getByRole("button", { name: "Apply" }).click();
  await expect(page.getByTestId("grid-notice")).toContainText("Saved 3 plan models");
  await goToColumn(page, "ceiling_cavity_r");
  for (const p of three) await expect(cell(page, p.id, "ceiling_cavity_r")).toHaveText("49");
  const afterBulk = await plansFromApi(page);
  for (const p of three) {
    const now = afterBulk.find((x) => x.id === p.id)!;
    expect(now.loads.facings[0].heatingBtuh).toBeLessThan(p.loads.facings[0].heatingBtuh);
  }

  // paste a block copied from a spreadsheet: two rows of bedrooms and occupants
  const ordered = afterBulk.filter((p) => ["AS-1450", "BR-1820"].includes(p.planCode));
  await goToColumn(page, "bedrooms");
  await cell(page, ordered[0].id, "bedrooms").click();
  await page.evaluate(() => {
    const data = new DataTransfer();
    data.setData("text/plain", "4\t6\n5\t7\n");
    document.activeElement!.dispatchEvent(
      new ClipboardEvent("paste", { clipboardData: data, bubbles: true, cancelable: true }),
    );
  });
  await expect(page.getByTestId("grid-notice")).toContainText("Saved 2 plan models");
  await expect(cell(page, ordered[0].id, "occupants")).toHaveText("6");
  await expect(cell(page, ordered[1].id, "bedrooms")).toHaveText("5");

  // air leakage: typing a CFM50 figure replaces the ACH50 one in the same save; a direct wall U-factor
  await goToColumn(page, "blower_door_cfm50");
  await cell(page, aster.id, "blower_door_cfm50").dblclick();
  await page.keyboard.type("1,000 CFM50");
  await page.keyboard.press("Enter");
  await expect(page.getByTestId("grid-notice")).toContainText("Saved 1 plan model");
  await expect(cell(page, aster.id, "blower_door_cfm50")).toHaveText("1,000");
  await expect(cell(page, aster.id, "blower_door_ach50")).toHaveText("");
  await goToColumn(page, "wall_u");
  await cell(page, aster.id, "wall_u").dblclick();
  await page.keyboard.type("0.05 U");
  await page.keyboard.press("Enter");
  await expect(page.getByTestId("grid-notice")).toContainText("Saved 1 plan model");
  await expect(cell(page, aster.id, "wall_u")).toHaveText("0.05");

  await page.screenshot({ path: testInfo.outputPath("plan-grid.png"), fullPage: true });
  await testInfo.attach("plan-grid", {
    path: testInfo.outputPath("plan-grid.png"),
    contentType: "image/png",
  });
  await signOut(page);

  // the reviewer approves the Aster's revision
  await signInAs(page, "reviewer@marrowfinch.test");
  await page.goto(`/plans/${aster.id}`);
  await expect(page.getByTestId("facing-matrix")).toBeVisible();
  await expect(page.getByTestId("chart-profile")).toBeVisible();
  // the sheet says which U-factors were entered and which computed, and how leakage was given
  await expect(page.getByTestId("air-leakage-used")).toHaveText("1000 CFM50");
  await expect(page.getByTestId("assembly-wall_u")).toHaveAttribute("data-source", "direct");
  await expect(page.getByTestId("assembly-wall_u")).toContainText("0.050");
  await expect(page.getByTestId("assembly-ceiling_u")).toHaveAttribute("data-source", "assembly");
  await expect(page.getByTestId("assembly-ceiling_u")).toContainText("base assembly + added insulation");
  // Both procedures side by side, the account's (the handbook's, by default) marked as sizing equipment.
  await expect(page.getByTestId("facing-procedure")).toContainText("Handbook load-factor");
  await expect(page.getByTestId("sizing-procedure")).toContainText(
    "Handbook residential load-factor procedure",
  );
  await expect(page.getByTestId("compare-facings").locator("tbody tr")).toHaveCount(4);
  await expect(page.getByTestId("compare-sensible-components")).toContainText("Total");
  const form = page.getByTestId("approve-form");
  await form.getByLabel("Credential").fill("Licensed mechanical engineer, TX 00000 (demo)");
  await form.getByRole("button", { name: /Approve revision/ }).click();
  await expect(page.getByTestId("revision-state")).toContainText("approved");
  await expect(page.getByTestId("revisions")).toContainText("Licensed mechanical engineer");
  await expect(page.getByTestId("plan-history")).toContainText("Approved AS-1450");
  await expect(page.getByTestId("caution")).toBeVisible();
  await page.screenshot({ path: testInfo.outputPath("plan-sheet.png"), fullPage: true });
  await testInfo.attach("plan-sheet", {
    path: testInfo.outputPath("plan-sheet.png"),
    contentType: "image/png",
  });
});

test("a viewer sees the library read-only", async ({ page }) => {
  await signInAs(page, "viewer@marrowfinch.test");
  await expect(page.getByTestId("plan-grid")).toBeVisible();
  await expect(page.getByTestId("bulk-edit")).toHaveCount(0);
  await expect(page.getByTestId("plan-import")).toHaveCount(0);
  const [p] = await plansFromApi(page);
  await goToColumn(page, "bedrooms");
  await cell(page, p.id, "bedrooms").dblclick();
  await expect(page.locator(".ag-cell-edit-wrapper, .ag-cell-inline-editing")).toHaveCount(0);
});
