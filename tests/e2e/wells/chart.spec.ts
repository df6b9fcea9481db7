import { test, expect, type Locator, type Page } from "@playwright/test";
import { signIn } from "../helpers/sign-in";

// The engineer opens a demo well that has a heading issue and reads its annotated
// trend: the shaded issue window with its plain label, and the valve reference
// lines explained under the pressure panel. The demo data are invented (scenario
// generator); nothing here checks an engineering value.

/** Waits up to `timeout` for the element; false when it does not come. */
async function isShown(locator: Locator, timeout: number): Promise<boolean> {
  return locator.waitFor({ state: "visible", timeout }).then(() => true, () => false);
}

/** A demo well with a heading issue: from the issue list, else by opening wells in turn. */
async function findHeadingWell(page: Page): Promise<string> {
  await page.goto("/issues?rule=heading");
  const row = page.locator('[data-testid="issue-row"][data-rule="heading"]').first();
  if (await isShown(row, 20_000)) {
    await row.getByRole("link").first().click();
    await page.waitForURL(/\/issues\/\d+/, { timeout: 60_000 });
    // The issue page shows the same trend chart, which names its well.
    const chart = page.locator('[data-testid="trend-chart"][data-well-id]').first();
    const id = (await isShown(chart, 30_000)) ? await chart.getAttribute("data-well-id") : null;
    if (id) return `/wells/${id}`;
  }
  await page.goto("/wells");
  const hrefs = await page.locator('a[href^="/wells/"]').evaluateAll((as) =>
    [...new Set(as.map((a) => a.getAttribute("href") ?? "").filter((h) => /^\/wells\/\d+$/.test(h)))],
  );
  for (const href of hrefs) {
    await page.goto(`${href}?range=30d`);
    const label = page.getByTestId("issue-window-label").filter({ hasText: "Heading" });
    if (await isShown(label.first(), 30_000)) return href;
  }
  throw new Error("no demo well with a heading issue was found");
}

test("the engineer sees a heading window and the valve reference lines on a well's trend", async ({ page }, testInfo) => {
  // The fallback may open several wells before it finds one.
  test.setTimeout(240_000);
  await signIn(page, "engineer");
  const wellPath = await findHeadingWell(page);

  // 30 days covers the whole demo period, so the issue window is in range.
  await page.goto(`${wellPath}?range=30d`);
  const chart = page.getByTestId("trend-chart");
  await expect(chart).toBeVisible();
  await expect(page.getByRole("link", { name: "30 d" })).toHaveAttribute("aria-current", "true");

  const heading = page.getByTestId("issue-window-label").filter({ hasText: "Heading" });
  await expect(heading.first()).toBeVisible({ timeout: 30_000 });

  // Plain names for a newcomer, and the valve lines explained.
  for (const name of ["Casing pressure", "Tubing pressure", "Injection gas", "Produced gas", "Liquid"]) {
    await expect(chart.getByRole("checkbox", { name })).toBeChecked();
  }
  const valves = page.getByTestId("valve-lines-legend");
  await expect(valves).toContainText("Valve reference lines");
  await expect(valves).toContainText(/V\d+ open [\d,]+ (psig|kPag)/);
  await expect(page.getByTestId("operating-valve")).toContainText("Operating valve");

  // Three panels, and the numbers behind them for those who cannot read the canvas.
  await expect(chart.locator("canvas")).toHaveCount(3);
  await page.getByText("Show the numbers").click();
  await expect(page.getByTestId("chart-numbers").locator("table")).toHaveCount(3);
  await expect(chart.getByRole("note")).toContainText("Advisory only");

  await page.screenshot({ path: testInfo.outputPath("well-trend-chart.png"), fullPage: true });
});

test("signals toggle, a drag zooms in to the stored values, and Reset returns", async ({ page }) => {
  await signIn(page, "engineer");
  await page.goto("/wells");
  const first = page.locator('a[href^="/wells/"]').filter({ hasNotText: /Add well|Import/ });
  const href = await first.evaluateAll((as) => as.map((a) => a.getAttribute("href") ?? "").find((h) => /^\/wells\/\d+$/.test(h)));
  expect(href).toBeTruthy();
  await page.goto(`${href}?range=1d`);
  const chart = page.getByTestId("trend-chart");
  await expect(chart.locator("canvas")).toHaveCount(3, { timeout: 30_000 });
  const casing = chart.getByRole("checkbox", { name: "Casing pressure" });
  await casing.uncheck();
  await expect(casing).not.toBeChecked();
  await expect(chart.locator("canvas")).toHaveCount(3);

  // Drag across the pressure panel: the chart fetches that shorter range, and Reset returns.
  const reset = chart.getByRole("button", { name: "Reset" });
  await expect(reset).toBeDisabled();
  const over = chart.locator(".u-over").first();
  const box = (await over.boundingBox())!;
  await page.mouse.move(box.x + box.width * 0.4, box.y + box.height / 2);
  await page.mouse.down();
  await page.mouse.move(box.x + box.width * 0.6, box.y + box.height / 2, { steps: 8 });
  await page.mouse.up();
  await expect(reset).toBeEnabled();
  await expect(chart.getByText("Every stored value is shown.")).toBeVisible({ timeout: 30_000 });
  await reset.click();
  await expect(reset).toBeDisabled();
});
