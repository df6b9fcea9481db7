// Rule settings cascade (organization → field → well), the preview that writes
// nothing, the re-run request, and refusals: wrong role 403, another organization's
// field or well 404. Expected values are regression values of our own code.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Op } from "sequelize";
import { AuditLog, Issue, IssueEvent, RuleSetting } from "@/models";
import { AppError } from "@/lib/errors";
import { QUEUES } from "@/lib/queue/jobs";
import { getQueue } from "@/lib/queue/queues";
import { producerConnection } from "@/lib/queue/connection";
import { generateWellScenario } from "@/lib/scenario/well-scenario";
import { getRuleSettings } from "@/lib/services/diagnose/get-rule-settings";
import { saveRuleSettings } from "@/lib/services/diagnose/save-rule-settings";
import { previewRuleSettings } from "@/lib/services/diagnose/preview-rule-settings";
import { requestDiagnosis } from "@/lib/services/diagnose/request-diagnosis";
import { getDiagnoseRun } from "@/lib/services/diagnose/get-diagnose-run";
import { unshelveExpiredIssues } from "@/lib/services/diagnose/unshelve-expired-issues";
import { closeDb, makeOrg, type TestOrg } from "../helpers";
import { addScenarioWell, writeSeries } from "./diagnose-fixtures";

const START = Date.UTC(2026, 8, 14);

let org: TestOrg;
let other: TestOrg;
let leakWell = 0;

async function codeOf(p: Promise<unknown>): Promise<string> {
  try {
    await p;
    return "ok";
  } catch (e) {
    if (e instanceof AppError) return e.code;
    throw e;
  }
}

beforeAll(async () => {
  org = await makeOrg("rules");
  other = await makeOrg("rules-other");
  const leak = generateWellScenario({ seed: 5, kind: "valve_leak", start: START, days: 5 });
  leakWell = await addScenarioWell(org.organizationId, org.padId, leak, "rules");
  await writeSeries(leakWell, leak.series);
});
afterAll(async () => {
  await producerConnection().quit().catch(() => undefined);
  await closeDb();
});

describe("rule settings", () => {
  it("cascade organization → field → well, number by number", async () => {
    const e = org.actors.engineer;
    await saveRuleSettings(e, { level: "organization" }, { valveLeak: { minDropPsi: 60, minDurationMinutes: 300 }, lifecycle: { verifyAfterMinutes: 720 } });
    await saveRuleSettings(e, { level: "field", fieldId: org.fieldId }, { valveLeak: { minDropPsi: 45 } });
    await saveRuleSettings(org.actors.admin, { level: "well", wellId: leakWell }, { heading: { minAutocorrelation: 0.5 } });
    const view = await getRuleSettings(e, { level: "well", wellId: leakWell });
    expect(view.override).toEqual({ heading: { minAutocorrelation: 0.5 } });
    expect(view.effective.rules.valveLeak.minDropPsi).toBe(45); // field beats organization
    expect(view.effective.rules.valveLeak.minDurationMinutes).toBe(300); // organization beats default
    expect(view.effective.rules.heading.minAutocorrelation).toBe(0.5);
    expect(view.inherited.rules.heading.minAutocorrelation).toBe(view.defaults.rules.heading.minAutocorrelation);
    expect(view.effective.lifecycle.verifyAfterMinutes).toBe(720);
    const audits = await AuditLog.count({ where: { organization_id: org.organizationId, action: "rule_settings.save" } });
    expect(audits).toBe(3);
  });

  it("refuses values outside the schema and unknown names (422)", async () => {
    const e = org.actors.engineer;
    expect(await codeOf(saveRuleSettings(e, { level: "organization" }, { valveLeak: { minDropPsi: -5 } }))).toBe("invalid");
    expect(await codeOf(saveRuleSettings(e, { level: "organization" }, { valveLeak: { nonsense: 1 } }))).toBe("invalid");
    expect(await codeOf(saveRuleSettings(e, { level: "organization" }, { heading: { minAutocorrelation: 2 } }))).toBe("invalid");
  });

  it("an empty set removes the level's row", async () => {
    await saveRuleSettings(org.actors.engineer, { level: "well", wellId: leakWell }, {});
    expect(await RuleSetting.count({ where: { organization_id: org.organizationId, well_id: leakWell } })).toBe(0);
  });

  it("preview counts issues per rule for current and candidate settings and writes nothing", async () => {
    const issuesBefore = await Issue.count({ where: { organization_id: org.organizationId } });
    const eventsBefore = await IssueEvent.count({ where: { organization_id: org.organizationId } });
    const p = await previewRuleSettings(org.actors.engineer, { scope: { level: "well", wellId: leakWell }, settings: { valveLeak: { minDropPsi: 5000 } }, days: 30 });
    const row = p.rules.find((r) => r.rule === "valve_leak")!;
    expect(row.current).toBeGreaterThanOrEqual(1);
    expect(row.candidate).toBe(0); // no leak drops 5,000 psi
    expect(p.wellsWithData).toBe(1);
    expect(await Issue.count({ where: { organization_id: org.organizationId } })).toBe(issuesBefore);
    expect(await IssueEvent.count({ where: { organization_id: org.organizationId } })).toBe(eventsBefore);
  });

  it("refuses the wrong role (403) and another organization's scope (404)", async () => {
    const scope = { level: "well", wellId: leakWell };
    for (const role of ["analyst", "operator"] as const) {
      const a = org.actors[role];
      expect(await codeOf(saveRuleSettings(a, { level: "organization" }, {}))).toBe("forbidden");
      expect(await codeOf(previewRuleSettings(a, { scope, settings: {} }))).toBe("forbidden");
      expect(await codeOf(requestDiagnosis(a, { wellId: leakWell }))).toBe("forbidden");
      expect(await codeOf(getRuleSettings(a, scope))).toBe("forbidden");
    }
    const stranger = other.actors.engineer;
    expect(await codeOf(saveRuleSettings(stranger, scope, {}))).toBe("not_found");
    expect(await codeOf(saveRuleSettings(stranger, { level: "field", fieldId: org.fieldId }, {}))).toBe("not_found");
    expect(await codeOf(previewRuleSettings(stranger, { scope, settings: {} }))).toBe("not_found");
    expect(await codeOf(requestDiagnosis(stranger, { wellId: leakWell }))).toBe("not_found");
    expect(await codeOf(requestDiagnosis(stranger, { fieldId: org.fieldId }))).toBe("not_found");
  });
});

describe("re-run requests", () => {
  it("queues a run the page can poll, visible only inside the organization", async () => {
    const run = await requestDiagnosis(org.actors.engineer, { wellId: leakWell });
    expect(run.status).toBe("queued");
    const job = await getQueue(QUEUES.diagnose).getJob(`run-${run.id}`);
    expect(job?.data).toMatchObject({ organizationId: org.organizationId, wellIds: [leakWell], reason: "manual", runId: run.id });
    await job?.remove();
    expect((await getDiagnoseRun(org.actors.analyst, run.id)).id).toBe(run.id);
    expect(await codeOf(getDiagnoseRun(other.actors.admin, run.id))).toBe("not_found");
  });
});

describe("shelving", () => {
  it("brings a shelved issue back to its earlier status once shelved_until has passed", async () => {
    const now = Date.now();
    const issue = await Issue.create({
      organization_id: org.organizationId, well_id: org.wellId, rule: "heading", status: "shelved", severity: 40, confidence: 0.8,
      started_at: new Date(now - 86_400_000), last_seen_at: new Date(now - 3_600_000), ended_at: null, summary: "test", production_at_risk_method: null,
      shelved_until: new Date(now - 60_000),
    });
    await IssueEvent.create({ organization_id: org.organizationId, issue_id: issue.id, user_id: org.actors.engineer.userId, kind: "shelved", from_status: "assigned", to_status: "shelved", data: {} });
    expect(await unshelveExpiredIssues(org.organizationId, now)).toBe(1);
    await issue.reload();
    expect([issue.status, issue.shelved_until]).toEqual(["assigned", null]);
    const ev = await IssueEvent.findOne({ where: { issue_id: issue.id, kind: "unshelved" } });
    expect([ev?.from_status, ev?.to_status, ev?.user_id]).toEqual(["shelved", "assigned", null]);
    expect(await unshelveExpiredIssues(org.organizationId, now)).toBe(0);
    expect(await IssueEvent.count({ where: { issue_id: issue.id, kind: { [Op.eq]: "unshelved" } } })).toBe(1);
  });
});
