import { expect, test } from "@playwright/test";
import { signIn, signInAs, signOut } from "./fixtures";

const NAV = ["Plans", "Communities", "Equipment", "Schedules", "Imports", "History", "Team", "Account"];
// Every role reads every page (a viewer "reads everything, changes nothing", lib/auth/permissions.ts); what a role
// may change is hidden on the pages and refused by the server.
const ROLE_NAV: Record<string, string[]> = {
  admin: NAV,
  designer: NAV,
  reviewer: NAV,
  purchasing: NAV,
  viewer: NAV,
};

for (const [role, items] of Object.entries(ROLE_NAV)) {
  test(`${role} signs in and sees the navigation for the role`, async ({ page }) => {
    await signInAs(page, `${role}@marrowfinch.test`);
    await expect(page.getByTestId("account-name")).toHaveText("Marrow & Finch Homes");
    await expect(page.getByTestId("role-badge")).toHaveText(role[0].toUpperCase() + role.slice(1));
    await expect(page.getByTestId("main-nav").getByRole("link")).toHaveText(items);
  });
}

test("a wrong password shows a clear error", async ({ page }) => {
  await signIn(page, "designer@marrowfinch.test", "not-the-password");
  await expect(page.getByTestId("sign-in-error")).toHaveText(
    "That e-mail and password do not match an account.",
  );
  await expect(page).toHaveURL(/sign-in/);
});

test("a consultant in two accounts picks the account and sees only its data", async ({ page }) => {
  await signIn(page, "consultant@loadworks.test");
  await expect(page.getByRole("heading", { name: "Choose an account" })).toBeVisible();
  await page.getByRole("button", { name: /Bramblewood Residential/ }).click();
  await expect(page.getByTestId("account-name")).toHaveText("Bramblewood Residential");
  await expect(page.getByTestId("plan-grid")).toContainText("HX-2100");
  await expect(page.getByTestId("plan-grid")).not.toContainText("AS-1450");
});

test("an admin invites a member, the mail arrives, the link sets a password and the member signs in", async ({
  page,
}) => {
  const email = `site.super.${Date.now()}@marrowfinch.test`;
  await signInAs(page, "admin@marrowfinch.test");
  await page.getByTestId("main-nav").getByRole("link", { name: "Team" }).click();
  const form = page.getByTestId("invite-form");
  await form.getByLabel("Name").fill("Sam Superintendent");
  await form.getByLabel("E-mail").fill(email);
  await form.getByLabel("Role").selectOption("viewer");
  await form.getByRole("button", { name: "Send invitation" }).click();
  await expect(page.getByTestId("invitations-list")).toContainText(email);

  // the development mailbox shows the account's admin the mail the account sent; the worker sends it
  // after the answer (a durable job), so the page is reloaded until it has arrived
  await page.goto("/dev/mailbox");
  const message = page.getByTestId("mail-message").filter({ hasText: email }).first();
  await expect(async () => {
    await page.reload();
    await expect(message.getByTestId("mail-subject")).toContainText("invited you to Marrow & Finch Homes", {
      timeout: 2_000,
    });
  }).toPass({ timeout: 60_000 });
  const body = await message.getByTestId("mail-body").innerText();
  const link = /http\S+\/invitation\/\S+/.exec(body)?.[0];
  expect(link).toBeTruthy();
  await signOut(page);

  await page.goto(link!);
  await page.getByLabel("Password (at least 10 characters)").fill("sam-super-pass");
  await page.getByLabel("Password again").fill("sam-super-pass");
  await page.getByRole("button", { name: "Set password and join" }).click();
  await expect(page.getByTestId("role-badge")).toHaveText("Viewer");
  await signOut(page);

  await signIn(page, email, "sam-super-pass");
  await expect(page.getByTestId("account-name")).toHaveText("Marrow & Finch Homes");
  await page.goto(link!);
  await expect(page.getByTestId("invitation-invalid")).toBeVisible();
});

test("a viewer sees the team read-only and the server refuses a role change", async ({ page }) => {
  await signInAs(page, "viewer@marrowfinch.test");
  await page.getByTestId("main-nav").getByRole("link", { name: "Team" }).click();
  await expect(page.getByTestId("members-table")).toContainText("designer@marrowfinch.test");
  await expect(page.getByTestId("invite-form")).toHaveCount(0);
  await expect(page.getByTestId("members-table").locator("select")).toHaveCount(0);
  const team = await page.request.get("/api/team");
  const { members } = (await team.json()) as { members: { membershipId: number; email: string }[] };
  const designer = members.find((m) => m.email === "designer@marrowfinch.test")!;
  const res = await page.request.patch(`/api/team/members/${designer.membershipId}`, {
    data: { role: "admin" },
  });
  expect(res.status()).toBe(403);
  expect(((await res.json()) as { error: { message: string } }).error.message).toContain("viewer");
});
