// Ranked list, summary, bulk triage, CSV export, saved filters and the
// other-organization 404 for every issue service.
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { isAppError } from "@/lib/errors";
import { listRankedIssues } from "@/lib/services/issues/list-ranked-issues";
import { getIssueSummary } from "@/lib/services/issues/get-issue-summary";
import { getIssue } from "@/lib/services/issues/get-issue";
import { acknowledgeIssue } from "@/lib/services/issues/acknowledge-issue";
import { assignIssue } from "@/lib/services/issues/assign-issue";
import { resolveIssue } from "@/lib/services/issues/resolve-issue";
import { dismissIssue } from "@/lib/services/issues/dismiss-issue";
import { shelveIssue } from "@/lib/services/issues/shelve-issue";
import { reopenIssue } from "@/lib/services/issues/reopen-issue";
import { addComment } from "@/lib/services/issues/add-comment";
import { addPhoto } from "@/lib/services/issues/add-photo";
import { openPhoto } from "@/lib/services/issues/open-photo";
import { bulkTriage } from "@/lib/services/issues/bulk-triage";
import { exportIssuesCsvText } from "@/lib/services/issues/export-issues-csv";
import { saveFilter } from "@/lib/services/issues/save-filter";
import { listSavedFilters } from "@/lib/services/issues/list-saved-filters";
import { deleteSavedFilter } from "@/lib/services/issues/delete-saved-filter";
import { listResolutionActions } from "@/lib/services/issues/list-resolution-actions";
import { saveResolutionActions } from "@/lib/services/issues/save-resolution-actions";
import { DEFAULT_RESOLUTION_ACTIONS, ISSUE_STATUSES } from "@/lib/validations/issues";
import { closeDb, makeOrg, type TestOrg } from "../helpers";
import { makeIssue, makeWell } from "./issue-fixtures";

const PNG = Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);
let org: TestOrg;
let other: TestOrg;
beforeAll(async () => {
  org = await makeOrg("list");
  other = await makeOrg("list-other");
});
afterAll(async () => { await closeDb(); });

async function code(p: Promise<unknown>): Promise<string> {
  try { await p; return "ok"; } catch (e) { if (isAppError(e)) return e.code; throw e; }
}

describe("ranked list", () => {
  it("ranks by production at risk, then severity; hides shelved and dismissed unless asked", async () => {
    const o = await makeOrg("rank");
    const a = await makeIssue(o, { risk: 10, severity: 90 });
    const b = await makeIssue(o, { risk: 80, severity: 20 });
    const c = await makeIssue(o, { risk: 80, severity: 70 });
    const s = await makeIssue(o, { risk: 500, status: "shelved" });
    const d = await makeIssue(o, { risk: 400, status: "dismissed" });
    const list = await listRankedIssues(o.actors.engineer, {});
    expect(list.rows.map((r) => r.id)).toEqual([c.id, b.id, a.id]);
    expect(list.total).toBe(3);
    expect(list.rows[0]).toMatchObject({ wellName: expect.any(String), fieldName: expect.any(String), padName: expect.any(String), ruleLabel: "Heading", unit: "bbl/d", status: "new" });
    const all = await listRankedIssues(o.actors.engineer, { status: "all" });
    expect(all.rows.map((r) => r.id).slice(0, 2)).toEqual([s.id, d.id]);
    const shelved = await listRankedIssues(o.actors.analyst, { status: "shelved" });
    expect(shelved.rows.map((r) => r.id)).toEqual([s.id]);
  });

  it("filters by rule, pad, assignee and start date, sorts and pages in the database", async () => {
    const o = await makeOrg("filter");
    const w = await makeWell(o);
    await makeIssue(o, { rule: "valve_leak", wellId: w, risk: 5 });
    const old = await makeIssue(o, { rule: "heading", startedAt: new Date("2020-01-01T00:00:00Z"), risk: 7 });
    const mine = await makeIssue(o, { status: "assigned", assigneeId: o.actors.operator.userId, risk: 9 });
    expect((await listRankedIssues(o.actors.engineer, { rule: "valve_leak" })).rows).toHaveLength(1);
    expect((await listRankedIssues(o.actors.engineer, { pad: o.padId })).total).toBe(3);
    expect((await listRankedIssues(o.actors.engineer, { pad: 999999 })).total).toBe(0);
    expect((await listRankedIssues(o.actors.engineer, { assignee: String(o.actors.operator.userId) })).rows.map((r) => r.id)).toEqual([mine.id]);
    expect((await listRankedIssues(o.actors.engineer, { assignee: "none" })).total).toBe(2);
    expect((await listRankedIssues(o.actors.engineer, { since: "2021-01-01" })).rows.map((r) => r.id)).not.toContain(old.id);
    const bySince = await listRankedIssues(o.actors.engineer, { sort: "since", dir: "asc", pageSize: 1, page: 1 });
    expect(bySince.rows.map((r) => r.id)).toEqual([old.id]);
    expect(bySince.total).toBe(3);
    expect((await listRankedIssues(o.actors.engineer, { sort: "since", dir: "asc", pageSize: 1, page: 3 })).rows.map((r) => r.id)).toEqual([mine.id]);
    expect(await code(listRankedIssues(o.actors.engineer, { sort: "drop table" }))).toBe("invalid");
  });

  it("pages every sort in both directions as sorting the whole list would, and filters by field", async () => {
    const o = await makeOrg("sorts");
    const w1 = await makeWell(o, `Bravo ${process.pid}`);
    const w2 = await makeWell(o, `Alpha ${process.pid}`);
    const made = [
      await makeIssue(o, { wellId: w1, rule: "heading", risk: 30, severity: 50, startedAt: new Date(Date.now() - 30 * 3600_000) }),
      await makeIssue(o, { wellId: w2, rule: "heading", risk: 30, severity: 80, startedAt: new Date(Date.now() - 5 * 3600_000) }),
      await makeIssue(o, { wellId: w1, rule: "valve_leak", risk: 90, severity: 20, status: "acknowledged", startedAt: new Date(Date.now() - 50 * 3600_000) }),
      await makeIssue(o, { wellId: w2, rule: "valve_leak", risk: 5, severity: 95, status: "assigned", assigneeId: o.actors.operator.userId }),
    ];
    await made[3].update({ priority: "high", due_on: "2026-12-09" });
    const all = (await listRankedIssues(o.actors.engineer, { pageSize: 100 })).rows;
    expect(all).toHaveLength(4);
    expect(all.find((r) => r.id === made[3].id)).toMatchObject({ priority: "high", dueOn: "2026-12-09", assigneeName: expect.any(String) });
    // The oracle: each sort key in JavaScript over the whole list, ties by id in the same direction.
    const keys: Record<string, (r: (typeof all)[number]) => (string | number)[]> = {
      risk: (r) => [r.productionAtRisk, r.severity],
      severity: (r) => [r.severity, -r.productionAtRisk],
      since: (r) => [Date.parse(r.since)],
      duration: (r) => [r.durationHours],
      well: (r) => [r.wellName],
      status: (r) => [ISSUE_STATUSES.indexOf(r.status)], // enum order, as declared
      lastChange: (r) => [Date.parse(r.lastChange)],
    };
    for (const [sort, key] of Object.entries(keys)) {
      for (const dir of ["asc", "desc"] as const) {
        const sign = dir === "asc" ? 1 : -1;
        const cmp = (a: (typeof all)[number], b: (typeof all)[number]) => {
          const [ka, kb] = [key(a), key(b)];
          for (let i = 0; i < ka.length; i++) if (ka[i] !== kb[i]) return (sort === "severity" && i === 1 ? 1 : sign) * (ka[i] < kb[i] ? -1 : 1);
          return sign * (a.id - b.id);
        };
        const want = [...all].sort(cmp).map((r) => r.id);
        const paged = [];
        for (let page = 1; page <= 2; page++) paged.push(...(await listRankedIssues(o.actors.engineer, { sort, dir, pageSize: 2, page })).rows.map((r) => r.id));
        expect({ sort, dir, ids: paged }).toEqual({ sort, dir, ids: want });
      }
    }
    expect((await listRankedIssues(o.actors.engineer, { field: o.fieldId })).total).toBe(4);
    expect((await listRankedIssues(o.actors.engineer, { field: other.fieldId })).total).toBe(0);
  });

  it("works from two copies of the list module sharing one pool, as a page and a route handler are bundled", async () => {
    const o = await makeOrg("copies");
    await makeIssue(o, { risk: 12 });
    vi.resetModules();
    const first = await import("@/lib/services/issues/issue-row");
    vi.resetModules();
    const second = await import("@/lib/services/issues/issue-row");
    const base = { sort: "risk", dir: "desc", page: 1, pageSize: 50 } as const;
    // Different shapes first in each copy, then each copy's again: every statement is named by its own text.
    expect(await first.countIssueRows(o.actors.engineer, { ...base, status: "all" })).toBe(1);
    expect(await second.countIssueRows(o.actors.engineer, base)).toBe(1);
    expect(await first.countIssueRows(o.actors.engineer, base)).toBe(1);
    expect((await second.selectIssueRows(o.actors.engineer, { ...base, status: "all" }, 50, 0)).length).toBe(1);
  });

  it("operators only ever see issues assigned to them", async () => {
    const o = await makeOrg("opview");
    const mine = await makeIssue(o, { status: "assigned", assigneeId: o.actors.operator.userId });
    await makeIssue(o, { status: "new" });
    const list = await listRankedIssues(o.actors.operator, { assignee: "none" });
    expect(list.total).toBe(0);
    expect((await listRankedIssues(o.actors.operator, {})).rows.map((r) => r.id)).toEqual([mine.id]);
    const summary = await getIssueSummary(o.actors.operator);
    expect(summary.wellsWithOpenIssues).toBe(1);
  });

  it("summary tiles", async () => {
    const o = await makeOrg("summary");
    await makeIssue(o, { risk: 30 });
    await makeIssue(o, { risk: 20, rule: "valve_leak" });
    const r = await makeIssue(o, { status: "assigned", assigneeId: o.actors.operator.userId });
    await resolveIssue(o.actors.operator, r.id, { action: "Other" });
    const s = await getIssueSummary(o.actors.engineer);
    expect(s.wellsMonitored).toBe(4); // makeOrg's well + three made here
    expect(s.wellsWithOpenIssues).toBe(2);
    expect(s.productionAtRisk).toEqual([{ unit: "bbl/d", value: 50 }]);
    expect(s.openedThisWeek).toBe(3);
    expect(s.resolvedThisWeek).toBe(1);
    expect(s.openPerDay).toHaveLength(30);
    expect(s.openPerDay.at(-1)!.open).toBe(2);
    expect(s.wellsByRule.map((x) => x.rule).sort()).toEqual(["heading", "valve_leak"]);
  });
});

describe("bulk triage", () => {
  it("reports each id: ok, conflict, foreign (404)", async () => {
    const a = await makeIssue(org);
    const b = await makeIssue(org, { status: "resolved" });
    const foreign = await makeIssue(other);
    const r = await bulkTriage(org.actors.engineer, { ids: [a.id, b.id, foreign.id], kind: "acknowledge" });
    expect(r.okCount).toBe(1);
    expect(r.results).toEqual([
      { id: a.id, ok: true, status: "acknowledged" },
      expect.objectContaining({ id: b.id, ok: false, code: "conflict" }),
      expect.objectContaining({ id: foreign.id, ok: false, code: "not_found" }),
    ]);
    const assign = await bulkTriage(org.actors.engineer, { ids: [a.id], kind: "assign", assigneeId: org.actors.operator.userId, priority: "high" });
    expect(assign.results[0]).toMatchObject({ ok: true, status: "assigned" });
    expect(await code(bulkTriage(org.actors.analyst, { ids: [a.id], kind: "acknowledge" }))).toBe("forbidden");
    expect(await code(bulkTriage(org.actors.engineer, { ids: [a.id], kind: "assign" }))).toBe("invalid");
  });
});

describe("CSV export (OWASP CSV Injection guidance)", () => {
  it("neutralises formula-looking names and exports the current view", async () => {
    const o = await makeOrg("csv");
    const w = await makeWell(o, "=HYPERLINK(\"http://evil.invalid\",\"x\")");
    await makeIssue(o, { wellId: w, risk: 12 });
    await makeIssue(o, { risk: 3, rule: "valve_leak" });
    const csv = await exportIssuesCsvText(o.actors.analyst, { rule: "heading" });
    const lines = csv.trim().split("\r\n");
    expect(lines[0]).toContain('"Production at risk"');
    expect(lines).toHaveLength(2);
    expect(lines[1]).toContain(`"'=HYPERLINK(""http://evil.invalid"",""x"")"`);
  });
});

describe("photos", () => {
  it("accepts a real PNG, refuses a lie about the type, a wrong type and more than 5 MB", async () => {
    const issue = await makeIssue(org, { status: "assigned", assigneeId: org.actors.operator.userId });
    const ok = await addPhoto(org.actors.operator, issue.id, { fileName: "../../valve.png", contentType: "image/png", bytes: PNG });
    const got = await openPhoto(org.actors.engineer, issue.id, ok.id);
    expect(got.contentType).toBe("image/png");
    expect(got.fileName).toBe("valve.png");
    const chunks: Buffer[] = [];
    for await (const c of got.body) chunks.push(Buffer.from(c as Buffer));
    expect(Buffer.concat(chunks).equals(Buffer.from(PNG))).toBe(true);
    expect(await code(addPhoto(org.actors.operator, issue.id, { fileName: "x.png", contentType: "image/png", bytes: new TextEncoder().encode("<script>") }))).toBe("invalid");
    expect(await code(addPhoto(org.actors.operator, issue.id, { fileName: "x.jpg", contentType: "image/jpeg", bytes: PNG }))).toBe("invalid");
    expect(await code(addPhoto(org.actors.operator, issue.id, { fileName: "x.svg", contentType: "image/svg+xml", bytes: PNG }))).toBe("invalid");
    const big = new Uint8Array(5 * 1024 * 1024 + 1);
    big.set(PNG);
    expect(await code(addPhoto(org.actors.operator, issue.id, { fileName: "big.png", contentType: "image/png", bytes: big }))).toBe("too_large");
    expect(await code(addPhoto(org.actors.analyst, issue.id, { fileName: "a.png", contentType: "image/png", bytes: PNG }))).toBe("forbidden");
    expect(await code(openPhoto(other.actors.admin, issue.id, ok.id))).toBe("not_found");
  });
});

describe("saved filters and resolution actions", () => {
  it("saves per person, replaces by name, deletes only one's own", async () => {
    const f = await saveFilter(org.actors.engineer, { name: "Heading, pad", query: "rule=heading&page=4&bogus=1" });
    expect(f.query).toBe("rule=heading");
    await saveFilter(org.actors.engineer, { name: "Heading, pad", query: "rule=heading&status=all" });
    expect(await listSavedFilters(org.actors.engineer)).toEqual([{ id: f.id, name: "Heading, pad", query: "rule=heading&status=all" }]);
    expect(await listSavedFilters(org.actors.analyst)).toEqual([]);
    expect(await code(deleteSavedFilter(org.actors.analyst, f.id))).toBe("not_found");
    expect(await code(saveFilter(org.actors.engineer, { name: "bad", query: "rule=nonsense" }))).toBe("invalid");
    await deleteSavedFilter(org.actors.engineer, f.id);
    expect(await listSavedFilters(org.actors.engineer)).toEqual([]);
  });

  it("resolution actions default, then are edited by engineers only", async () => {
    const o = await makeOrg("actions");
    expect(await listResolutionActions(o.actors.operator)).toEqual(DEFAULT_RESOLUTION_ACTIONS);
    expect(await code(saveResolutionActions(o.actors.analyst, ["A"]))).toBe("forbidden");
    expect(await code(saveResolutionActions(o.actors.engineer, ["A", "a"]))).toBe("invalid");
    await saveResolutionActions(o.actors.engineer, ["Gas rate cut", "Other"]);
    expect(await listResolutionActions(o.actors.operator)).toEqual(["Gas rate cut", "Other"]);
    expect(await listResolutionActions(org.actors.operator)).toEqual(DEFAULT_RESOLUTION_ACTIONS);
  });
});

describe("another organization's issue is 404 for every service", () => {
  const future = new Date(Date.now() + 86_400_000 * 2).toISOString().slice(0, 10);
  const calls: [string, (id: number) => Promise<unknown>][] = [
    ["getIssue", (id) => getIssue(other.actors.admin, id)],
    ["acknowledgeIssue", (id) => acknowledgeIssue(other.actors.admin, id)],
    ["assignIssue", (id) => assignIssue(other.actors.admin, id, { assigneeId: other.actors.operator.userId })],
    ["resolveIssue", (id) => resolveIssue(other.actors.admin, id, { action: "Other" })],
    ["dismissIssue", (id) => dismissIssue(other.actors.admin, id, { reason: "data_problem" })],
    ["shelveIssue", (id) => shelveIssue(other.actors.admin, id, { until: future })],
    ["reopenIssue", (id) => reopenIssue(other.actors.admin, id)],
    ["addComment", (id) => addComment(other.actors.admin, id, { body: "hello" })],
    ["addPhoto", (id) => addPhoto(other.actors.admin, id, { fileName: "p.png", contentType: "image/png", bytes: PNG })],
    ["openPhoto", (id) => openPhoto(other.actors.admin, id, 1)],
  ];
  it.each(calls)("%s", async (_name, call) => {
    const issue = await makeIssue(org, { status: "new" });
    expect(await code(call(issue.id))).toBe("not_found");
  });

  it("listRankedIssues and the summary never include it", async () => {
    const issue = await makeIssue(org);
    expect((await listRankedIssues(other.actors.admin, { status: "all", pageSize: 200 })).rows.map((r) => r.id)).not.toContain(issue.id);
    expect((await exportIssuesCsvText(other.actors.admin, { status: "all" }))).not.toContain(`"${issue.id}"`);
  });
});

describe("issue page data", () => {
  it("has evidence, history with names, comments, valve design vs inferred", async () => {
    const issue = await makeIssue(org);
    await acknowledgeIssue(org.actors.engineer, issue.id);
    await addComment(org.actors.engineer, issue.id, { body: "Checking the casing trend" });
    const d = await getIssue(org.actors.engineer, issue.id);
    expect(d.evidence[0]).toMatchObject({ threshold: 10 });
    expect(d.inferredOperatingValve).toBe(3);
    expect(d.history.map((h) => h.kind)).toEqual(["acknowledge", "comment"]);
    expect(d.history[0]!.userName).toMatch(/^engineer /);
    expect(d.comments[0]!.body).toBe("Checking the casing trend");
    expect(d.allowedActions).toEqual(["assign", "dismiss", "shelve"]);
    expect(await code(getIssue(org.actors.operator, issue.id))).toBe("not_found");
  });
});
