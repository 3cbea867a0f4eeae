import path from "node:path";
import ExcelJS from "exceljs";
import { expect, test, type Page } from "@playwright/test";
import { signInAs } from "./fixtures";

interface ApiLot {
  id: number;
  lotNumber: string;
  planCode: string;
  facingDeg: number;
  frozen: boolean;
  currentDiffers: boolean;
  version: number;
  loads: { coolingTotalBtuh: number; heatingBtuh: number };
}

const lotCell = (page: Page, lotId: number, colId: string) =>
  page.locator(`[row-id="${lotId}"] [col-id="${colId}"]`).first();

test("create a community from a preset, import lots, turn lots, freeze one for permit, download the schedule", async ({
  page,
}, testInfo) => {
  await signInAs(page, "designer@marrowfinch.test");
  await page.getByTestId("main-nav").getByRole("link", { name: "Communities" }).click();
  await page.getByRole("button", { name: "New community" }).click();
  const form = page.getByTestId("conditions-form");
  await form.getByLabel("Start from a climate preset").selectOption("southeast-mixed-humid");
  await expect(page.getByTestId("preset-caution")).toContainText(
    "Approximate — verify with your local code's design conditions",
  );
  await expect(form.getByLabel("Heating outdoor dry bulb (°F)")).toHaveValue("23");
  await form.getByLabel("Community name").fill("Fernbrook Phase 2");
  await form.getByLabel("Heating outdoor dry bulb (°F)").fill("22");
  await form.getByRole("button", { name: "Create community" }).click();
  await expect(page.getByTestId("community-name")).toHaveText("Fernbrook Phase 2");
  await expect(page.getByTestId("conditions-summary")).toContainText("heating 22 °F");
  const communityId = Number(/communities\/(\d+)/.exec(page.url())![1]);

  // import the demo lots file, with the progress bar to the end
  await page
    .locator("#lot-import-file")
    .setInputFiles(path.resolve(__dirname, "../../templates/demo-lots.csv"));
  await page.getByTestId("lot-import").getByRole("button", { name: "Import" }).click();
  await expect(page.getByTestId("import-progress")).toBeVisible();
  await expect(page.getByTestId("lot-import-result")).toContainText("40 lots created");
  await expect(page.getByTestId("lot-count")).toHaveText("40 lots");

  const lotsNow = async () =>
    ((await (await page.request.get(`/api/communities/${communityId}/lots`)).json()) as { lots: ApiLot[] })
      .lots;
  let lots = await lotsNow();
  expect(lots.every((l) => l.loads.coolingTotalBtuh > 0)).toBe(true);
  await expect(lotCell(page, lots[0].id, "coolingTotalBtuh")).not.toHaveText("");

  // turn three lots to face west
  const three = lots.filter((l) => l.facingDeg !== 270).slice(0, 3);
  const before = new Map<number, string>();
  for (const l of three) {
    before.set(l.id, await lotCell(page, l.id, "coolingTotalBtuh").innerText());
    await page.locator(`[row-id="${l.id}"] .ag-selection-checkbox input`).first().check();
  }
  await page.locator("#bulk-facing").fill("W");
  await page.getByTestId("lots-bulk").getByRole("button", { name: "Apply to selected" }).click();
  await expect(page.getByTestId("lots-notice")).toContainText("Saved 3 lots");
  for (const l of three) {
    await expect(lotCell(page, l.id, "facing")).toHaveText("W (270°)");
    await expect(lotCell(page, l.id, "coolingTotalBtuh")).not.toHaveText(before.get(l.id)!);
  }
  await page.screenshot({ path: testInfo.outputPath("lots-grid.png"), fullPage: true });
  await testInfo.attach("lots-grid", {
    path: testInfo.outputPath("lots-grid.png"),
    contentType: "image/png",
  });

  // submit one lot for permit through the status cell
  lots = await lotsNow();
  const target = lots.find((l) => l.planCode === "AS-1450") ?? lots[0];
  await lotCell(page, target.id, "status").dblclick();
  // AG Grid's select editor opens its list on ArrowDown
  await page.keyboard.press("ArrowDown");
  await page.getByRole("option", { name: "Permit submitted" }).click();
  await expect(page.getByTestId("lots-notice")).toContainText("frozen");
  await expect(lotCell(page, target.id, "snapshot")).toHaveText("frozen");
  const frozenCool = await lotCell(page, target.id, "coolingTotalBtuh").innerText();

  // a plan edit recomputes the open lots but not the frozen copy; the lot says the plan differs
  const library = (await (await page.request.get("/api/plans")).json()) as {
    plans: { id: number; planCode: string; version: number }[];
  };
  const plan = library.plans.find((p) => p.planCode === target.planCode)!;
  const edit = await page.request.patch("/api/plans", {
    data: { changes: [{ planId: plan.id, version: plan.version, cells: { blower_door_ach50: "8" } }] },
  });
  expect(edit.status()).toBe(200);
  await page.reload();
  await expect(lotCell(page, target.id, "snapshot")).toHaveText("frozen · plan differs");
  await expect(lotCell(page, target.id, "coolingTotalBtuh")).toHaveText(frozenCool);
  const open = (await lotsNow()).find((l) => l.planCode === target.planCode && !l.frozen)!;
  await expect(lotCell(page, open.id, "changed")).toHaveText("changed");

  // download the permit schedule
  const downloadPromise = page.waitForEvent("download");
  await page.getByTestId("permit-schedule-xlsx").click();
  const download = await downloadPromise;
  const file = testInfo.outputPath("permit-schedule.xlsx");
  await download.saveAs(file);
  const workbook = new ExcelJS.Workbook();
  await workbook.xlsx.readFile(file);
  const sheet = workbook.worksheets[0];
  expect(sheet.rowCount).toBe(41);
  const headers = (sheet.getRow(1).values as unknown[]).slice(1);
  expect(headers).toContain("Cooling total (Btu/h)");
  const frozenRow = sheet.getRows(2, 40)!.find((r) => r.getCell(1).value === target.lotNumber)!;
  expect(String(frozenRow.getCell(headers.indexOf("Loads from") + 1).value)).toMatch(/permit snapshot/);
  expect(String(frozenRow.getCell(headers.indexOf("Caution") + 1).value)).toMatch(/licensed professional/);
});

test("a viewer sees lots read-only and no import", async ({ page }) => {
  await signInAs(page, "viewer@marrowfinch.test");
  await page.getByTestId("main-nav").getByRole("link", { name: "Communities" }).click();
  await expect(page.getByRole("button", { name: "New community" })).toHaveCount(0);
  await page.getByRole("link", { name: "Cedar Hollow" }).click();
  await expect(page.getByTestId("lots-grid")).toBeVisible();
  await expect(page.getByTestId("lot-import")).toHaveCount(0);
  await expect(page.getByTestId("lots-bulk")).toHaveCount(0);
});
