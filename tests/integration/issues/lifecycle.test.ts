// The triage lifecycle per role and per starting status, against the real
// database. The transition table is our own design (ISA-18.2 words for
// acknowledged and shelved, common practice in alarm management).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AuditLog, Issue, IssueEvent, Notification } from "@/models";
import { isAppError } from "@/lib/errors";
import type { Actor } from "@/lib/auth/actor";
import type { Role } from "@/lib/auth/roles";
import { ISSUE_STATUSES, type IssueStatus } from "@/lib/validations/issues";
import { TRANSITIONS, type TriageAction } from "@/lib/services/issues/issue-transitions";
import { acknowledgeIssue } from "@/lib/services/issues/acknowledge-issue";
import { assignIssue } from "@/lib/services/issues/assign-issue";
import { resolveIssue } from "@/lib/services/issues/resolve-issue";
import { dismissIssue } from "@/lib/services/issues/dismiss-issue";
import { shelveIssue } from "@/lib/services/issues/shelve-issue";
import { reopenIssue } from "@/lib/services/issues/reopen-issue";
import { closeDb, makeOrg, type TestOrg } from "../helpers";
import { makeIssue } from "./issue-fixtures";

let org: TestOrg;
beforeAll(async () => { org = await makeOrg("lifecycle"); });
afterAll(async () => { await closeDb(); });

const future = () => new Date(Date.now() + 3 * 86_400_000).toISOString().slice(0, 10);

function run(action: TriageAction, actor: Actor, id: number): Promise<unknown> {
  switch (action) {
    case "acknowledge": return acknowledgeIssue(actor, id);
    case "assign": return assignIssue(actor, id, { assigneeId: org.actors.operator.userId, priority: "high" });
    case "resolve": return resolveIssue(actor, id, { action: "Choke adjusted", note: "opened one step" });
    case "dismiss": return dismissIssue(actor, id, { reason: "false_alarm" });
    case "shelve": return shelveIssue(actor, id, { until: future() });
    case "reopen": return reopenIssue(actor, id);
  }
}

async function outcome(p: Promise<unknown>): Promise<string> {
  try { await p; return "ok"; } catch (e) { if (isAppError(e)) return e.code; throw e; }
}

const ROLE_ALLOWED: Record<Role, TriageAction[]> = {
  admin: ["acknowledge", "assign", "resolve", "dismiss", "shelve", "reopen"],
  engineer: ["acknowledge", "assign", "dismiss", "shelve", "reopen"],
  operator: ["resolve"],
  analyst: [],
};

describe("transition table from every status (admin, who may do every action)", () => {
  const cases = (Object.keys(TRANSITIONS) as TriageAction[]).flatMap((a) => ISSUE_STATUSES.map((s) => [a, s] as const));
  it.each(cases)("%s from %s", async (action, status) => {
    const issue = await makeIssue(org, { status: status as IssueStatus, assigneeId: org.actors.operator.userId });
    const r = await outcome(run(action, org.actors.admin, issue.id));
    expect(r).toBe(TRANSITIONS[action].from.includes(status as IssueStatus) ? "ok" : "conflict");
  });

  it("says why a transition is refused", async () => {
    const issue = await makeIssue(org, { status: "resolved" });
    await expect(acknowledgeIssue(org.actors.engineer, issue.id)).rejects.toThrow(/Cannot acknowledge an issue that is resolved/);
  });
});

describe("roles", () => {
  it.each((["admin", "engineer", "operator", "analyst"] as Role[]).flatMap((role) => (Object.keys(TRANSITIONS) as TriageAction[]).map((a) => [role, a] as const)))(
    "%s may %s only when the role allows it",
    async (role, action) => {
      // An issue in a status the action accepts, assigned to the operator so assignment is not the obstacle.
      const status = TRANSITIONS[action].from[0]!;
      const issue = await makeIssue(org, { status, assigneeId: org.actors.operator.userId });
      const r = await outcome(run(action, org.actors[role], issue.id));
      expect(r).toBe(ROLE_ALLOWED[role].includes(action) ? "ok" : "forbidden");
    },
  );

  it("an operator cannot see or resolve an issue not assigned to them (404)", async () => {
    const issue = await makeIssue(org, { status: "assigned", assigneeId: null });
    expect(await outcome(resolveIssue(org.actors.operator, issue.id, { action: "Other", note: "" }))).toBe("not_found");
  });

  it("an admin may resolve any issue", async () => {
    const issue = await makeIssue(org, { status: "acknowledged" });
    expect(await outcome(resolveIssue(org.actors.admin, issue.id, { action: "Other" }))).toBe("ok");
  });

  it("assign accepts only an operator of the same organization", async () => {
    const other = await makeOrg("lifecycle-other");
    const issue = await makeIssue(org);
    expect(await outcome(assignIssue(org.actors.engineer, issue.id, { assigneeId: other.actors.operator.userId }))).toBe("invalid");
    expect(await outcome(assignIssue(org.actors.engineer, issue.id, { assigneeId: org.actors.analyst.userId }))).toBe("invalid");
  });

  it("resolve accepts only an action from the organization's list", async () => {
    const issue = await makeIssue(org, { status: "assigned", assigneeId: org.actors.operator.userId });
    expect(await outcome(resolveIssue(org.actors.operator, issue.id, { action: "Prayed" }))).toBe("invalid");
  });

  it("shelve needs a future date", async () => {
    const issue = await makeIssue(org);
    expect(await outcome(shelveIssue(org.actors.engineer, issue.id, { until: "2001-01-01" }))).toBe("invalid");
  });
});

describe("history, audit and notifications", () => {
  it("assign then resolve writes issue_events and audit rows with from/to, and tells both people", async () => {
    const issue = await makeIssue(org);
    await acknowledgeIssue(org.actors.engineer, issue.id);
    await assignIssue(org.actors.engineer, issue.id, { assigneeId: org.actors.operator.userId, priority: "urgent", dueOn: future() });
    await resolveIssue(org.actors.operator, issue.id, { action: "Injection rate changed", note: "cut to 600 Mscf/d" });
    const events = await IssueEvent.findAll({ where: { issue_id: issue.id }, order: [["id", "ASC"]] });
    expect(events.map((e) => [e.kind, e.from_status, e.to_status])).toEqual([
      ["acknowledge", "new", "acknowledged"],
      ["assign", "acknowledged", "assigned"],
      ["resolve", "assigned", "resolved"],
    ]);
    const audits = await AuditLog.findAll({ where: { entity_type: "issue", entity_id: String(issue.id) }, order: [["id", "ASC"]] });
    expect(audits.map((a) => a.action)).toEqual(["issue.acknowledge", "issue.assign", "issue.resolve"]);
    expect(audits[2]!.before).toMatchObject({ status: "assigned" });
    expect(audits[2]!.after).toMatchObject({ status: "resolved", resolved_action: "Injection rate changed" });
    const fresh = await Issue.findByPk(issue.id);
    expect(fresh!.resolved_by).toBe(org.actors.operator.userId);
    const toOperator = await Notification.findAll({ where: { user_id: org.actors.operator.userId!, kind: "issue.assigned" } });
    expect(toOperator.some((n) => n.link === `/issues/${issue.id}`)).toBe(true);
    const toEngineer = await Notification.findAll({ where: { user_id: org.actors.engineer.userId!, kind: "issue.resolved" } });
    expect(toEngineer.some((n) => n.link === `/issues/${issue.id}`)).toBe(true);
  });

  it("reopen returns to assigned when someone holds it, and is refused while a newer live issue exists", async () => {
    const a = await makeIssue(org, { status: "resolved", assigneeId: org.actors.operator.userId });
    expect(await reopenIssue(org.actors.engineer, a.id)).toMatchObject({ status: "assigned" });
    const old = await makeIssue(org, { status: "dismissed" });
    await makeIssue(org, { status: "new", wellId: old.well_id, rule: old.rule });
    expect(await outcome(reopenIssue(org.actors.engineer, old.id))).toBe("conflict");
  });
});
