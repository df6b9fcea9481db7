import { test, expect } from "@playwright/test";
import { signIn, type DemoRole } from "../helpers/sign-in";
import { waitForMail, firstLink } from "../helpers/mailbox";

// What each demo role sees in the main navigation (lib/auth/roles.ts).
const SEES: Record<DemoRole, { yes: string[]; no: string[] }> = {
  admin: { yes: ["Wells", "People", "API keys"], no: [] },
  analyst: { yes: ["Wells", "Uploads"], no: ["People", "API keys", "Rule settings"] },
  engineer: { yes: ["Wells", "Issues"], no: ["People", "API keys"] },
  operator: { yes: ["Wells"], no: ["People", "API keys", "Uploads"] },
};

for (const role of Object.keys(SEES) as DemoRole[]) {
  test(`${role} signs in and sees what the role may see`, async ({ page }) => {
    await signIn(page, role);
    const nav = page.getByRole("navigation", { name: "Main" });
    for (const label of SEES[role].yes) await expect(nav.getByRole("link", { name: label })).toBeVisible();
    for (const label of SEES[role].no) await expect(nav.getByRole("link", { name: label })).toHaveCount(0);
    await page.screenshot({ path: test.info().outputPath(`${role}-home.png`), fullPage: true });
  });
}

test("an engineer opening an admin URL is refused", async ({ page }) => {
  await signIn(page, "engineer");
  await page.goto("/admin/users");
  await expect(page.getByRole("heading", { name: "Not allowed for your role" })).toBeVisible();
});

test("the signed-out are sent to sign in", async ({ page }) => {
  await page.goto("/wells");
  await expect(page).toHaveURL(/\/login/);
});

test("a wrong password gives a clear message", async ({ page }) => {
  await page.goto("/login");
  await page.getByLabel("E-mail").fill("nobody-here@demo.bellows.test");
  await page.getByLabel("Password").fill("not-the-password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByText(/E-mail or password is not right/)).toBeVisible();
});

test("an admin invites a person who sets a password from the e-mail and signs in", async ({ page, browser }) => {
  const email = `new.person.${Date.now()}@demo.bellows.test`;
  await signIn(page, "admin");
  await page.goto("/admin/users");
  await page.getByLabel("Name").fill("Morgan Testwell");
  await page.getByLabel("E-mail").fill(email);
  await page.locator("#invite-role").selectOption("analyst");
  await page.getByRole("button", { name: "Send invitation" }).click();
  await expect(page.getByRole("status")).toContainText("Invitation sent");
  await expect(page.getByRole("cell", { name: email })).toBeVisible();

  const mail = await waitForMail(email, /invited to Bellows/);
  const link = new URL(firstLink(mail.text));
  const ctx = await browser.newContext();
  const guest = await ctx.newPage();
  await guest.goto(link.pathname);
  await guest.getByLabel("New password (at least 10 characters)").fill("a-long-new-secret");
  await guest.getByLabel("Repeat the password").fill("a-long-new-secret");
  await guest.getByRole("button", { name: "Set password and join" }).click();
  await expect(guest.getByRole("status")).toContainText("Your password is set");
  await signIn(guest, { email, password: "a-long-new-secret" });
  await expect(guest.getByTestId("whoami")).toContainText("Morgan Testwell");
  await guest.screenshot({ path: test.info().outputPath("invited-signed-in.png") });
  await ctx.close();
});

test("a password reset link works once", async ({ page }) => {
  await page.goto("/forgot");
  await page.getByLabel("E-mail").fill("operator2@demo.bellows.test");
  await page.getByRole("button", { name: "Send reset link" }).click();
  await expect(page.getByRole("status")).toContainText("reset link is on its way");
  const mail = await waitForMail("operator2@demo.bellows.test", /Reset your Bellows password/);
  const path = new URL(firstLink(mail.text)).pathname;
  await page.goto(path);
  await page.getByLabel("New password (at least 10 characters)").fill("bellows-demo");
  await page.getByLabel("Repeat the password").fill("bellows-demo");
  await page.getByRole("button", { name: "Set new password" }).click();
  await expect(page.getByRole("status")).toContainText("Your password is set");
  await page.goto(path);
  await expect(page.getByText("This link has expired or was already used")).toBeVisible();
});
