import { test, expect, type Page } from "@playwright/test";
import { signIn } from "../helpers/sign-in";

// Historian uploads end to end: an analyst sends a small wide CSV for one demo
// well, maps it, starts processing and watches it finish; an administrator
// creates and revokes an API key. The readings are invented test data inside
// plausible ranges; no engineering value is checked here.

/**
 * A wide file, one minute apart, at a time of its own per run so reruns store new
 * values. One casing pressure cell carries historian status text ("Bad"), which must
 * be refused and listed in the rejected rows, never fatal (DOMAIN.md §2, practice).
 */
function wideCsv(rows: number): string {
  const minutesIntoYear = Math.floor(Date.now() / 60_000) % (360 * 24 * 60);
  const start = Date.UTC(2019, 0, 1) + minutesIntoYear * 60_000;
  const lines = ["Timestamp,Casing pressure (psig),Tubing pressure (psig),Injection rate (Mscf/d)"];
  for (let i = 0; i < rows; i++) {
    const t = new Date(start + i * 60_000).toISOString().replace(".000Z", "Z");
    const casing = i === 7 ? "Bad" : (905 + (i % 5) * 0.8).toFixed(1);
    lines.push(`${t},${casing},${(182 + (i % 3) * 0.5).toFixed(1)},${610 + (i % 4)}`);
  }
  return lines.join("\n") + "\n";
}

async function shot(page: Page, name: string) {
  await page.screenshot({ path: test.info().outputPath(name), fullPage: true });
}

test("an analyst uploads a wide CSV, maps it and sees it processed", async ({ page }) => {
  const fileName = `e2e-wide-${Date.now()}.csv`;
  await signIn(page, "analyst");
  await page.goto("/uploads");
  await expect(page.getByRole("heading", { name: "Historian uploads" })).toBeVisible();
  await shot(page, "uploads-empty-form.png");

  await page.getByLabel("Historian CSV files").setInputFiles({ name: fileName, mimeType: "text/csv", buffer: Buffer.from(wideCsv(30), "utf8") });
  const sent = page.getByTestId("sent-file").filter({ hasText: fileName });
  await expect(sent.getByTestId("detection-preview")).toBeVisible();
  await expect(sent.getByText("Wide: one column per signal")).toBeVisible();
  await shot(page, "uploads-detected.png");

  await sent.getByRole("link", { name: "Map columns and signals" }).click();
  await expect(page).toHaveURL(/\/uploads\/\d+\/map$/);
  await expect(page.getByRole("heading", { name: `Map ${fileName}` })).toBeVisible();
  await page.getByLabel("Layout", { exact: true }).selectOption("wide");
  await page.getByLabel("The whole file is one well").check();
  // The first registered demo well.
  await page.getByLabel("Well for this file").selectOption({ index: 1 });
  await expect(page.getByLabel("Signal of column Casing pressure (psig)")).toHaveValue("casing_pressure");
  await expect(page.getByLabel("Unit of column Casing pressure (psig)")).toHaveValue("psig");
  await shot(page, "uploads-mapping.png");

  await page.getByRole("button", { name: "Start processing" }).click();
  await expect(page).toHaveURL(/\/uploads(\?.*)?$/);

  const history = page.getByRole("table", { name: "Upload history" });
  const row = history.getByTestId("upload-row").filter({ hasText: fileName });
  await expect(row.getByRole("progressbar", { name: `Progress of ${fileName}` })).toBeVisible();
  await expect(row.getByTestId("upload-status")).toHaveText("Done", { timeout: 75_000 });
  await expect(row.getByRole("progressbar", { name: `Progress of ${fileName}` })).toHaveAttribute("aria-valuenow", "100");
  const stored = Number((await row.getByTestId("values-stored").innerText()).replace(/[^\d]/g, ""));
  expect(stored).toBeGreaterThan(0);
  await expect(row.getByText("status text instead of a value")).toBeVisible();
  await shot(page, "uploads-done.png");

  const [download] = await Promise.all([page.waitForEvent("download"), row.getByRole("link", { name: "Rejected rows" }).click()]);
  expect(download.suggestedFilename()).toMatch(/rejected-rows\.csv$/);
  const rejected = await download.createReadStream().then(async (s) => {
    const parts: Buffer[] = [];
    for await (const c of s) parts.push(c as Buffer);
    return Buffer.concat(parts).toString("utf8");
  });
  expect(rejected).toContain("Bad");
});

test("an administrator creates an API key, sees it once, and revokes it", async ({ page }) => {
  const name = `E2E key ${Date.now()}`;
  await signIn(page, "admin");
  await page.goto("/admin/api-keys");
  await expect(page.getByRole("heading", { name: "API keys" })).toBeVisible();

  await page.getByLabel("Key name (what will use it)").fill(name);
  await page.getByRole("button", { name: "Create key" }).click();
  const shown = page.getByTestId("new-api-key");
  await expect(shown).toContainText("it will not be shown again");
  await expect(page.getByTestId("new-api-key-value")).toHaveText(/^\S{20,}$/);
  const row = page.getByTestId("api-key-row").filter({ hasText: name });
  await expect(row).toBeVisible();
  await expect(row.getByTestId("api-key-revoked")).toHaveText("—");
  await shot(page, "api-key-created.png");

  page.once("dialog", (d) => d.accept());
  await row.getByRole("button", { name: "Revoke" }).click();
  await expect(row.getByTestId("api-key-revoked")).toHaveText(/UTC$/);
  await expect(row.getByRole("button", { name: "Revoke" })).toHaveCount(0);
  await shot(page, "api-key-revoked.png");
});
