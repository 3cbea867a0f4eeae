import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import ExcelJS from "exceljs";
import { PDFParse } from "pdf-parse";
import { expect, test } from "@playwright/test";
import { TEST_MAILBOX_DIR } from "../support/test-env";
import { signInAs, signOut } from "./fixtures";

interface ApiLot {
  id: number;
  lotNumber: string;
  systemCode: string | null;
}

const squash = (text: string) => text.replace(/\s+/g, " ").trim();

async function pdfText(bytes: Uint8Array): Promise<string> {
  const parser = new PDFParse({ data: new Uint8Array(bytes) });
  const result = await parser.getText();
  await parser.destroy();
  return squash(result.text);
}

test("purchasing sees every lot's system counted, exports the equipment schedule and e-mails the permit packet", async ({
  page,
}, testInfo) => {
  test.setTimeout(120_000);
  await signInAs(page, "purchasing@marrowfinch.test");
  await page.getByTestId("main-nav").getByRole("link", { name: "Schedules" }).click();
  await expect(page.getByRole("heading", { name: "Schedules" })).toBeVisible();
  await expect(page.getByTestId("caution").first()).toContainText("licensed professional");

  // the counts on the page are the lots' systems, counted here from the lots grid's data
  const communities = (
    (await (await page.request.get("/api/communities")).json()) as {
      communities: { id: number; name: string }[];
    }
  ).communities;
  const cedar = communities.find((c) => c.name === "Cedar Hollow")!;
  await page.getByTestId("schedule-community").selectOption(String(cedar.id));
  const lots = (
    (await (await page.request.get(`/api/communities/${cedar.id}/lots`)).json()) as { lots: ApiLot[] }
  ).lots;
  const expected = new Map<string, number>();
  for (const lot of lots)
    if (lot.systemCode) expected.set(lot.systemCode, (expected.get(lot.systemCode) ?? 0) + 1);
  expect(expected.size).toBeGreaterThan(0);
  await expect(page.getByTestId("system-counts")).toBeVisible();
  for (const [code, n] of expected)
    await expect(page.getByTestId(`system-count-${code}`)).toHaveText(String(n));
  await expect(page.getByTestId("system-counts").locator("tbody tr")).toHaveCount(expected.size);
  const without = lots.length - [...expected.values()].reduce((a, b) => a + b, 0);
  await expect(page.getByTestId("schedule-totals")).toContainText(
    `${lots.length} lots · ${lots.length - without} with a system · ${without} without`,
  );
  await expect(page.getByTestId("limits-used")).toContainText("Sizing limits used");
  await expect(page.getByTestId("lot-reports").locator("tbody tr")).toHaveCount(lots.length);

  // export the equipment schedule
  const downloadPromise = page.waitForEvent("download");
  await page.getByTestId("equipment-schedule-xlsx").click();
  const download = await downloadPromise;
  const file = testInfo.outputPath("equipment-schedule.xlsx");
  await download.saveAs(file);
  const workbook = new ExcelJS.Workbook();
  await workbook.xlsx.readFile(file);
  const totals = workbook.getWorksheet("System totals")!;
  const fromFile = new Map<string, number>();
  totals.eachRow((row, n) => {
    if (n > 1 && row.getCell(1).value !== "Total")
      fromFile.set(String(row.getCell(1).value), Number(row.getCell(5).value));
  });
  expect(Object.fromEntries(fromFile)).toEqual(Object.fromEntries(expected));

  // e-mail the permit packet
  const to = `permit.desk.${Date.now()}@county-office.test`;
  const send = page.getByTestId("send-form");
  await send.getByLabel(/^To/).fill(to);
  await send.getByLabel("What to send").selectOption("permit-packet-all");
  await send.getByRole("button", { name: "Send" }).click();
  await expect(page.getByTestId("send-result")).toContainText(`Sent to ${to}`, { timeout: 60_000 });
  await expect(page.getByTestId("packet-list")).toContainText(to);
  await expect(page.getByTestId("packet-list")).toContainText("Priya Lund");
  await page.screenshot({ path: testInfo.outputPath("schedules.png"), fullPage: true });
  await testInfo.attach("schedules", {
    path: testInfo.outputPath("schedules.png"),
    contentType: "image/png",
  });

  // the message is in the development mailbox (an admin's page), with the PDF attached
  await signOut(page);
  await signInAs(page, "admin@marrowfinch.test");
  await page.goto("/dev/mailbox");
  const message = page.getByTestId("mail-message").filter({ hasText: to }).first();
  await expect(message.getByTestId("mail-subject")).toContainText("Cedar Hollow");
  await expect(message).toContainText(/Attachments: permit-packet-Cedar-Hollow-.*\.pdf/);
  await expect(message.getByTestId("mail-body")).toContainText("licensed professional");

  // the attachment as the mail fake received it opens as a PDF and carries the caution
  const stored = readdirSync(TEST_MAILBOX_DIR)
    .filter((n) => n.endsWith(".json"))
    .map(
      (n) =>
        JSON.parse(readFileSync(path.join(TEST_MAILBOX_DIR, n), "utf8")) as {
          to: string[];
          attachments: { filename: string; contentBase64?: string }[];
        },
    )
    .find((m) => m.to.includes(to))!;
  const pdf = new Uint8Array(Buffer.from(stored.attachments[0].contentBase64!, "base64"));
  const text = await pdfText(pdf);
  expect(text).toContain("design estimates");
  expect(text).toContain("licensed professional");
  for (const lot of lots) expect(text).toContain(`Lot ${lot.lotNumber}`);
});

test("a viewer sees the schedule but no packet or e-mail controls", async ({ page }) => {
  await signInAs(page, "viewer@marrowfinch.test");
  await page.goto("/schedules");
  await expect(page.getByTestId("system-counts")).toBeVisible();
  await expect(page.getByTestId("caution").first()).toBeVisible();
  await expect(page.getByTestId("schedules-read-only")).toBeVisible();
  await expect(page.getByTestId("packet-maker")).toHaveCount(0);
  await expect(page.getByTestId("send-form")).toHaveCount(0);
  const communities = (
    (await (await page.request.get("/api/communities")).json()) as { communities: { id: number }[] }
  ).communities;
  const refused = await page.request.post(`/api/communities/${communities[0].id}/packets`, { data: {} });
  expect(refused.status()).toBe(403);
});
