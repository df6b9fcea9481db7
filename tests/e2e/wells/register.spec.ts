import { test, expect, type Page } from "@playwright/test";
import { signIn } from "../helpers/sign-in";

// The well register end to end: an analyst adds a well by hand, imports its
// valve design from CSV (a bad file first, then a fixed one) and finds the
// mandrels on the well page. The valve figures are invented test data inside
// the schema's plausible ranges; no engineering value is checked here.

const HEADER = "uwi,position,md_ft,tvd_ft,kind,port_in,valve_od_in,r_ratio,tro_psig,installed_on";

function valveCsv(uwi: string, rows: string[]): string {
  return [HEADER, ...rows.map((r) => `${uwi},${r}`)].join("\n") + "\n";
}

async function chooseCsv(page: Page, name: string, text: string) {
  await page.getByLabel("CSV file").setInputFiles({ name, mimeType: "text/csv", buffer: Buffer.from(text, "utf8") });
}

test("an analyst creates a well and imports its valve design from CSV", async ({ page }) => {
  const stamp = Date.now();
  const uwi = `E2E-${stamp}`;
  const name = `Test well ${stamp}`;

  await signIn(page, "analyst");
  await page.goto("/wells");
  await page.getByRole("link", { name: "Add well" }).click();
  await expect(page).toHaveURL(/\/wells\/new$/);

  // The shared schema speaks before anything reaches the server.
  await page.getByRole("button", { name: "Create well" }).click();
  await expect(page.getByText("Enter the well name")).toBeVisible();

  await page.getByLabel("Well name").fill(name);
  await page.getByLabel("Identifier").fill(uwi);
  // An existing pad from the demo register: the first one offered.
  await page.getByLabel("Pad", { exact: true }).selectOption({ index: 1 });
  await page.getByLabel("Tubing inner diameter (in)").fill("1.995");
  await page.getByLabel("Tubing depth (ft)").fill("7800");
  await page.getByLabel("Perforation depth (ft)").fill("8000");
  await page.getByLabel("Surface temperature (°F)").fill("80");
  await page.getByLabel("Bottom-hole temperature (°F)").fill("180");
  await page.getByLabel("Injection gas specific gravity").fill("0.65");
  await page.getByLabel("Liquid gravity (°API, or SG for water)").fill("38");
  await page.getByLabel("Water cut (fraction 0–1)").fill("0.4");
  await page.getByLabel("Reservoir static pressure (psig)").fill("1800");
  await page.getByLabel("Available injection pressure (psig)").fill("1100");
  await page.getByRole("button", { name: "Create well" }).click();

  await expect(page).toHaveURL(/\/wells\/\d+$/);
  const wellUrl = page.url();
  await expect(page.getByTestId("well-name")).toHaveText(name);
  await expect(page.getByText("No mandrels on file for this well.")).toBeVisible();

  // The register finds it by identifier.
  await page.goto(`/wells?q=${encodeURIComponent(uwi)}`);
  await expect(page.getByTestId("well-row")).toHaveCount(1);
  await expect(page.getByTestId("well-row")).toContainText(uwi);

  // A valve design with one bad row (line 4 of the file: kind "bogus").
  await page.getByRole("link", { name: "Import from CSV" }).click();
  await expect(page).toHaveURL(/\/wells\/import$/);
  await chooseCsv(
    page,
    "valves-bad.csv",
    valveCsv(uwi, [
      "1,2200,2150,ipo,0.25,1.5,,1025,2026-01-15",
      "2,3900,3800,ipo,0.25,1.5,,1019,2026-01-15",
      "3,5300,5150,bogus,0.25,1.5,,1009,2026-01-15",
      "4,6400,6200,orifice,0.1875,,,,2026-01-15",
    ]),
  );
  const errors = page.getByRole("table", { name: "Rows with errors" });
  await expect(errors).toBeVisible();
  const kindRow = errors
    .locator("tbody tr")
    .filter({ has: page.getByRole("cell", { name: "4", exact: true }) })
    .filter({ has: page.getByRole("cell", { name: "kind", exact: true }) });
  await expect(kindRow).toHaveCount(1);
  await expect(kindRow).toContainText("ipo, orifice or dummy");
  const changes = page.getByTestId("import-changes");
  await expect(changes.getByTestId("import-change-row").filter({ hasText: uwi })).toContainText("Skipped");
  await page.screenshot({ path: test.info().outputPath("import-preview.png"), fullPage: true });

  // Confirming writes nothing for a well with a bad row.
  await page.getByRole("button", { name: "Confirm import" }).click();
  const result = page.getByTestId("import-result");
  await expect(result).toBeVisible();
  await expect(result.getByRole("status")).toContainText("Nothing was written");
  await expect(result.getByTestId("import-change-row").filter({ hasText: uwi })).toContainText("Skipped");

  // The fixed file: three good rows.
  await chooseCsv(
    page,
    "valves-fixed.csv",
    valveCsv(uwi, [
      "1,2200,2150,ipo,0.25,1.5,,1025,2026-01-15",
      "2,3900,3800,ipo,0.25,1.5,,1019,2026-01-15",
      "3,6400,6200,orifice,0.1875,,,,2026-01-15",
    ]),
  );
  await expect(page.getByTestId("import-preview")).toBeVisible();
  await expect(page.getByRole("table", { name: "Rows with errors" })).toHaveCount(0);
  await expect(page.getByTestId("import-changes").getByTestId("import-change-row").filter({ hasText: uwi })).toContainText("Create");
  await page.screenshot({ path: test.info().outputPath("import-preview-fixed.png"), fullPage: true });
  await page.getByRole("button", { name: "Confirm import" }).click();
  await expect(page.getByTestId("import-result").getByRole("status")).toContainText("Written: 1 new");

  // The well page shows the three mandrels, top to bottom, with the design table and the caution.
  await page.goto(wellUrl);
  const mandrels = page.getByTestId("mandrel-row");
  await expect(mandrels).toHaveCount(3);
  await expect(mandrels.nth(0)).toContainText("Unloading valve (IPO)");
  await expect(mandrels.nth(2)).toContainText("Orifice");
  await expect(page.getByTestId("design-pressure-table")).toBeVisible();
  await expect(page.getByRole("region", { name: "Design surface pressures" }).getByRole("note")).toContainText("Advisory only");
  await expect(page.locator("section#trends")).toHaveCount(1);
  await page.screenshot({ path: test.info().outputPath("well-page.png"), fullPage: true });
});

test("a field operator reads the register but is offered no edits", async ({ page }) => {
  await signIn(page, "operator");
  await page.goto("/wells");
  await expect(page.getByRole("heading", { name: "Wells" })).toBeVisible();
  await expect(page.getByRole("link", { name: "Add well" })).toHaveCount(0);
  await expect(page.getByRole("link", { name: "Import from CSV" })).toHaveCount(0);
  await page.goto("/wells/import");
  await expect(page).toHaveURL(/\/forbidden/);
});
