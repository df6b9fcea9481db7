import { expect, type Page } from "@playwright/test";

export type DemoRole = "admin" | "analyst" | "engineer" | "operator";
export const DEMO_PASSWORD = "bellows-demo";

/** Sign in through the real form as one of the demo people. */
export async function signIn(page: Page, role: DemoRole | { email: string; password: string }) {
  const email = typeof role === "string" ? `${role}@demo.bellows.test` : role.email;
  const password = typeof role === "string" ? DEMO_PASSWORD : role.password;
  await page.goto("/login");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).not.toHaveURL(/\/login/);
}
