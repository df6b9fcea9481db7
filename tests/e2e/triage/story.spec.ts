import { test, expect, type Page, type Browser } from "@playwright/test";
import { signIn } from "../helpers/sign-in";
import { messagesTo, type SentMail } from "../helpers/mailbox";
import { generateField } from "@/lib/scenario/field";
import { writeWideCsv } from "@/lib/ingest/write-csv";

// The whole triage story on the demo organization, one screen after another:
// (a) the analyst uploads a historian file for one demo well and watches it finish;
// (b) the engineer finds a heading well in the ranked list, reads its chart with the
//     shaded, labelled issue window and assigns it to the operator;
// (c) the operator, on a phone-sized screen, finds it in My work and resolves it;
// (d) the engineer sees it resolved, and both e-mails are in the fake mailbox.
// The demo wells and readings are invented (scenario generator); no engineering
// value is checked here.

const DEMO_FIELD_SEED = 7101; // the first demo field (lib/services/demo/seed-demo.ts)
const OPERATOR_EMAIL = "operator@demo.bellows.test";
const ENGINEER_EMAIL = "engineer@demo.bellows.test";

async function shot(page: Page, name: string) {
  await page.screenshot({ path: test.info().outputPath(name), fullPage: true });
}

/**
 * One day of one quiet demo well's scenario, written as a wide historian file. The
 * dates sit in early 2019, before the demo period, so the upload adds history and
 * never overwrites the demo's recent readings.
 */
function demoWellCsv(): { wellName: string; csv: string } {
  const start = Date.UTC(2019, 1, 1);
  const field = generateField({ seed: DEMO_FIELD_SEED, wells: 16, days: 4, start, wellsPerPad: 6 });
  const well = field.wells.find((w) => w.kind === "normal") ?? field.wells[0]!;
  const s = well.series;
  const rows = Array.from({ length: 24 * 60 }, (_, i) => ({
    t: s.t[i]!,
    values: [Math.round(s.casing[i]! * 10) / 10, Math.round(s.tubing[i]! * 10) / 10, Math.round(s.injection[i]!)],
  }));
  return { wellName: well.name, csv: writeWideCsv(["Casing pressure (psig)", "Tubing pressure (psig)", "Injection rate (Mscf/d)"], rows) };
}

/** A message to `address` about this issue, sent after `since`. */
async function waitForIssueMail(address: string, subject: RegExp, issueId: string, since: number): Promise<SentMail> {
  const until = Date.now() + 30_000;
  while (Date.now() < until) {
    const found = (await messagesTo(address)).find((m) => subject.test(m.subject) && m.text.includes(`/issues/${issueId}`) && new Date(m.at).getTime() >= since - 5_000);
    if (found) return found;
    await new Promise((r) => setTimeout(r, 400));
  }
  throw new Error(`no mail to ${address} matching ${subject} for issue ${issueId}`);
}

async function newPage(browser: Browser, baseURL: string | undefined, viewport?: { width: number; height: number }) {
  // Contexts made by hand do not inherit the config's baseURL.
  const context = await browser.newContext({ baseURL, ...(viewport ? { viewport, isMobile: true, hasTouch: true } : {}) });
  return { context, page: await context.newPage() };
}

test("upload, rank, chart, assign, resolve on a phone, and the e-mails", async ({ browser, baseURL }) => {
  test.setTimeout(240_000);
  const startedAt = Date.now();

  // (a) The analyst uploads a demo historian file and watches the progress bar finish.
  const { wellName, csv } = demoWellCsv();
  const fileName = `story-${wellName.replace(/\W+/g, "-")}-${Date.now()}.csv`;
  const analyst = await newPage(browser, baseURL);
  await signIn(analyst.page, "analyst");
  await analyst.page.goto("/uploads");
  await analyst.page.getByLabel("Historian CSV files").setInputFiles({ name: fileName, mimeType: "text/csv", buffer: Buffer.from(csv, "utf8") });
  const sent = analyst.page.getByTestId("sent-file").filter({ hasText: fileName });
  await sent.getByRole("link", { name: "Map columns and signals" }).click();
  await expect(analyst.page).toHaveURL(/\/uploads\/\d+\/map$/);
  await analyst.page.getByLabel("Layout", { exact: true }).selectOption("wide");
  await analyst.page.getByLabel("The whole file is one well").check();
  const wellSelect = analyst.page.getByLabel("Well for this file");
  const optionValue = await wellSelect.locator("option").filter({ hasText: wellName }).first().getAttribute("value");
  expect(optionValue, `demo well ${wellName} is in the register`).toBeTruthy();
  await wellSelect.selectOption(optionValue!);
  await shot(analyst.page, "a1-upload-mapping.png");
  await analyst.page.getByRole("button", { name: "Start processing" }).click();
  await expect(analyst.page).toHaveURL(/\/uploads(\?.*)?$/);
  const row = analyst.page.getByRole("table", { name: "Upload history" }).getByTestId("upload-row").filter({ hasText: fileName });
  const progress = row.getByRole("progressbar", { name: `Progress of ${fileName}` });
  await expect(progress).toBeVisible();
  await expect(progress).toHaveAttribute("aria-valuenow", "100", { timeout: 90_000 });
  await shot(analyst.page, "a2-upload-done.png");
  await analyst.context.close();

  // (b) The engineer finds a heading well near the top of the ranked list.
  const engineer = await newPage(browser, baseURL);
  await signIn(engineer.page, "engineer");
  await expect(engineer.page).toHaveURL(/\/issues/);
  await expect(engineer.page.getByRole("table", { name: "Ranked issues" })).toBeVisible();
  await engineer.page.getByLabel("Issue type").selectOption("heading");
  await expect(engineer.page).toHaveURL(/rule=heading/);
  const headingRow = engineer.page.locator('[data-testid="issue-row"][data-rule="heading"]').first();
  await expect(headingRow).toBeVisible();
  await shot(engineer.page, "b1-ranked-list-heading.png");
  await headingRow.getByRole("link").first().click();
  await expect(engineer.page).toHaveURL(/\/issues\/\d+$/);
  const issueId = engineer.page.url().match(/\/issues\/(\d+)$/)![1]!;

  // Its chart shows the shaded window with its label.
  const chart = engineer.page.locator("#issue-chart");
  await expect(chart).toBeVisible();
  await expect(chart.getByTestId("issue-window-label").filter({ hasText: "Heading" }).first()).toBeVisible({ timeout: 45_000 });
  await expect(engineer.page.getByRole("note").first()).toContainText("Advisory only");
  await shot(engineer.page, "b2-issue-chart.png");

  // Assign to the operator (a reassignment when the demo already gave it to someone).
  await engineer.page.getByRole("button", { name: /^(Reassign|Assign)…$/ }).click();
  const dialog = engineer.page.getByRole("dialog", { name: "Assign to a field operator" });
  await dialog.getByLabel("Operator").selectOption({ label: "Cal Dunmore" });
  await dialog.getByLabel("Priority").selectOption("high");
  await shot(engineer.page, "b3-assign-dialog.png");
  await dialog.getByRole("button", { name: "Assign", exact: true }).click();
  await expect(engineer.page.getByTestId("issue-status").first()).toHaveText("Assigned");

  // (c) The operator, on a phone, finds it in My work and resolves it.
  const operator = await newPage(browser, baseURL, { width: 390, height: 844 });
  await signIn(operator.page, "operator");
  await expect(operator.page).toHaveURL(/\/my-work/);
  const card = operator.page.locator(`a[data-testid="my-work-card"][href="/issues/${issueId}"]`);
  await expect(card).toBeVisible();
  const box = await card.boundingBox();
  expect(box!.height, "a large tap target").toBeGreaterThanOrEqual(44);
  await shot(operator.page, "c1-my-work-phone.png");
  await card.click();
  await expect(operator.page).toHaveURL(new RegExp(`/issues/${issueId}$`));
  const resolve = operator.page.getByRole("form", { name: "Resolve issue" });
  await expect(resolve).toBeVisible();
  // On a small screen the resolve form comes before the evidence and the chart.
  const formTop = (await resolve.boundingBox())!.y;
  const evidenceTop = (await operator.page.getByRole("heading", { name: "What Bellows saw" }).boundingBox())!.y;
  expect(formTop).toBeLessThan(evidenceTop);
  await resolve.getByLabel("What was done").selectOption("Choke adjusted");
  await resolve.getByLabel("Note").fill("Opened the choke one step; tubing swings calmer after 30 min.");
  await shot(operator.page, "c2-resolve-phone.png");
  await resolve.getByRole("button", { name: "Resolve issue" }).click();
  await expect(operator.page.getByTestId("issue-status").first()).toHaveText("Resolved");
  await shot(operator.page, "c3-resolved-phone.png");
  await operator.context.close();

  // (d) The engineer sees it resolved, with the history, and the e-mails went out.
  await engineer.page.reload();
  await expect(engineer.page.getByTestId("issue-status").first()).toHaveText("Resolved");
  await expect(engineer.page.getByTestId("resolution")).toContainText("Choke adjusted");
  await expect(engineer.page.getByTestId("issue-history")).toContainText("Assigned → Resolved");
  await shot(engineer.page, "d1-engineer-sees-resolved.png");
  const assignedMail = await waitForIssueMail(OPERATOR_EMAIL, /^Assigned to you: Heading/, issueId, startedAt);
  expect(assignedMail.text).toContain("Advisory only");
  const resolvedMail = await waitForIssueMail(ENGINEER_EMAIL, /^Resolved: Heading/, issueId, startedAt);
  expect(resolvedMail.text).toContain("Choke adjusted");
  await engineer.context.close();
});
