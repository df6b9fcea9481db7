// Findings of one well become issues: one live issue per (well, rule) that the
// diagnosis extends rather than duplicates, with hysteresis (lifecycle-settings.ts).
//
// Per rule, each finding (oldest first) meets the well's issues of that rule:
// - a live issue (new, acknowledged, assigned, recurred, shelved) is extended:
//   last_seen_at moves forward, started_at back, severity takes the max, and the
//   newest view of the signature (summary, evidence, annotations, confidence,
//   production at risk) replaces the old one. ended_at is set once the signature
//   has been absent closeAfterMinutes of data, and cleared when it comes back;
// - otherwise the newest closed issue decides:
//   resolved / verified: signature seen only up to resolved_at + resolveGraceMinutes
//     is the old episode (nothing happens); seen after that and within
//     recurrenceWindowDays → the issue becomes "recurred" (+1, an event); later → new issue;
//   dismissed: a finding starting within quietGapMinutes of its end extends it
//     quietly (it stays dismissed); later → new issue;
// - nothing matches → a new issue ("opened" event).
// Afterwards: live issues whose signature has been absent closeAfterMinutes are
// marked ended, and resolved issues whose signature stayed away verifyAfterMinutes
// of data after resolved_at become "verified".
//
// Re-running the same data changes nothing: every value is a max/min or the same
// finding's words, and a row is only written when a value really differs (so
// updated_at and issue_events stay as they were). A per-well advisory lock keeps
// two workers from opening the same issue twice.
import type { InferCreationAttributes, Transaction } from "sequelize";
import { Issue, IssueEvent, sequelize } from "@/models";
import { LIVE_STATUSES, type IssueStatus } from "@/models/issue";
import type { Finding, RuleKey } from "@/lib/diagnostics/types";
import { DEFAULT_LIFECYCLE, type IssueLifecycle } from "./lifecycle-settings";
import { isSameJson, toJson } from "./same-json";

const MINUTE_MS = 60_000;
/** First key of the two-integer advisory lock: "diagnose one well". */
export const WELL_LOCK_NAMESPACE = 7_302_101;

export interface ApplyCounts {
  opened: number;
  updated: number;
  recurred: number;
  verified: number;
}

export interface ApplyOptions {
  lifecycle?: IssueLifecycle;
  transaction?: Transaction;
  /**
   * The run's `from`: the rules judged findings starting at or after it with their
   * whole look-back. A finding starting earlier was judged with less (its baseline
   * cut short by the start of the data), so at the same last sighting it does not
   * replace a stored view (see extendIssue). Unset: every finding counts as whole.
   */
  judgedFrom?: number;
}

type Patch = Partial<{
  status: IssueStatus;
  severity: number;
  confidence: number;
  started_at: Date;
  last_seen_at: Date;
  ended_at: Date | null;
  production_at_risk: number;
  production_at_risk_unit: string;
  production_at_risk_method: string | null;
  summary: string;
  evidence: unknown;
  annotations: unknown;
  recurrence_count: number;
}>;

// The model types JSONB columns loosely (CreationOptional<unknown>); these name the casts once.
type IssueUpdate = Parameters<Issue["set"]>[0] & object;
type IssueCreate = InferCreationAttributes<Issue>;

interface PendingEvent {
  kind: string;
  from_status: string | null;
  to_status: string | null;
  data: Record<string, unknown>;
}

export async function applyFindings(
  organizationId: number,
  wellId: number,
  findings: Finding[],
  ranUntil: number,
  options: ApplyOptions = {},
): Promise<ApplyCounts> {
  const run: RunScope = { ranUntil, life: options.lifecycle ?? DEFAULT_LIFECYCLE, judgedFrom: options.judgedFrom ?? -Infinity };
  const apply = (transaction: Transaction) => applyInTransaction(organizationId, wellId, findings, run, transaction);
  return options.transaction ? apply(options.transaction) : sequelize.transaction(apply);
}

/** What the run saw: the end of its data, the lifecycle settings, and judgedFrom (ApplyOptions). */
interface RunScope {
  ranUntil: number;
  life: IssueLifecycle;
  judgedFrom: number;
}

async function applyInTransaction(organizationId: number, wellId: number, findings: Finding[], run: RunScope, transaction: Transaction): Promise<ApplyCounts> {
  await sequelize.query("SELECT pg_advisory_xact_lock(:ns, :well)", { replacements: { ns: WELL_LOCK_NAMESPACE, well: wellId }, transaction });
  const issues = await Issue.findAll({
    where: { organization_id: organizationId, well_id: wellId },
    order: [["started_at", "DESC"], ["id", "DESC"]],
    transaction,
  });
  const counts: ApplyCounts = { opened: 0, updated: 0, recurred: 0, verified: 0 };
  const byRule = new Map<string, Finding[]>();
  for (const f of findings) byRule.set(f.rule, [...(byRule.get(f.rule) ?? []), f]);
  const rules = new Set<string>([...byRule.keys(), ...issues.map((i) => i.rule)]);
  for (const rule of rules) {
    const list = (byRule.get(rule) ?? []).slice().sort((a, b) => a.start - b.start);
    await applyRule(organizationId, wellId, rule as RuleKey, list, issues.filter((i) => i.rule === rule), run, transaction, counts);
  }
  return counts;
}

async function applyRule(
  organizationId: number,
  wellId: number,
  rule: RuleKey,
  findings: Finding[],
  issues: Issue[],
  run: RunScope,
  transaction: Transaction,
  counts: ApplyCounts,
): Promise<void> {
  const { ranUntil, life, judgedFrom } = run;
  const closeMs = life.closeAfterMinutes * MINUTE_MS;
  const graceMs = life.resolveGraceMinutes * MINUTE_MS;
  let live = issues.find((i) => LIVE_STATUSES.includes(i.status));
  const touched = new Map<Issue, { patch: Patch; events: PendingEvent[]; isNew: boolean }>();
  const work = (issue: Issue) => {
    let w = touched.get(issue);
    if (!w) touched.set(issue, (w = { patch: {}, events: [], isNew: false }));
    return w;
  };

  for (const f of findings) {
    const lastSeen = f.end ?? ranUntil;
    const isOngoing = f.end === null || ranUntil - f.end < closeMs;
    if (live) {
      extendIssue(live, work(live), f, lastSeen, isOngoing, judgedFrom);
      continue;
    }
    const prev = issues.find((i) => !LIVE_STATUSES.includes(i.status));
    if (prev && (prev.status === "resolved" || prev.status === "verified")) {
      const fixedAt = (prev.resolved_at ?? prev.updated_at).getTime();
      if (lastSeen <= fixedAt + graceMs) continue; // the episode before the fix
      if (Math.max(f.start, fixedAt) <= fixedAt + life.recurrenceWindowDays * 1440 * MINUTE_MS) {
        const w = work(prev);
        const count = prev.recurrence_count + 1;
        w.events.push({ kind: "recurred", from_status: prev.status, to_status: "recurred", data: { recurrenceCount: count, seenAt: new Date(Math.max(f.start, fixedAt + graceMs)).toISOString() } });
        setValue(prev, w.patch, "status", "recurred");
        setValue(prev, w.patch, "recurrence_count", count);
        extendIssue(prev, w, f, lastSeen, isOngoing, judgedFrom);
        live = prev;
        continue;
      }
    } else if (prev && prev.status === "dismissed") {
      const prevEnd = (prev.ended_at ?? prev.last_seen_at).getTime();
      if (f.start <= prevEnd + life.quietGapMinutes * MINUTE_MS) {
        const w = work(prev);
        if (lastSeen > prev.last_seen_at.getTime()) {
          setValue(prev, w.patch, "last_seen_at", new Date(lastSeen));
          setValue(prev, w.patch, "ended_at", isOngoing ? null : new Date(lastSeen));
        }
        continue;
      }
    }
    live = openIssue(organizationId, wellId, rule, f, lastSeen, isOngoing);
    const w = work(live);
    w.isNew = true;
    w.events.push({ kind: "opened", from_status: null, to_status: "new", data: { severity: live.severity, startedAt: live.started_at.toISOString() } });
    issues.unshift(live);
  }

  // The signature has stayed away long enough: the live issue has ended.
  if (live && !touched.get(live)?.isNew) {
    const w = work(live);
    const endedAt = "ended_at" in w.patch ? w.patch.ended_at : live.ended_at;
    const lastSeen = (w.patch.last_seen_at ?? live.last_seen_at).getTime();
    if (endedAt === null && ranUntil - lastSeen >= closeMs) setValue(live, w.patch, "ended_at", new Date(lastSeen));
  }

  // Resolved and stayed away for the verification time (in data) → verified.
  for (const issue of issues) {
    if (issue.status !== "resolved" || touched.get(issue)?.patch.status) continue;
    const fixedAt = (issue.resolved_at ?? issue.updated_at).getTime();
    if (ranUntil < fixedAt + life.verifyAfterMinutes * MINUTE_MS) continue;
    if (findings.some((f) => (f.end ?? ranUntil) > fixedAt + graceMs)) continue;
    const w = work(issue);
    setValue(issue, w.patch, "status", "verified");
    w.events.push({ kind: "verified", from_status: "resolved", to_status: "verified", data: { cleanMinutes: Math.round((ranUntil - fixedAt) / MINUTE_MS) } });
  }

  for (const [issue, w] of touched) {
    if (w.isNew) {
      // Later findings of the same run may have extended the new issue already;
      // its history starts with one "opened" event at the final severity.
      issue.set(w.patch as IssueUpdate);
      w.events = w.events.filter((e) => e.kind === "opened").map((e) => ({ ...e, data: { ...e.data, severity: issue.severity } }));
      await issue.save({ transaction });
      counts.opened++;
    } else if (Object.keys(w.patch).length) {
      await issue.update(w.patch as IssueUpdate, { transaction });
      counts.updated++;
      if (w.patch.status === "recurred") counts.recurred++;
      if (w.patch.status === "verified") counts.verified++;
    }
    if (w.events.length) {
      await IssueEvent.bulkCreate(
        w.events.map((e) => ({ ...e, organization_id: organizationId, issue_id: issue.id, user_id: null })),
        { transaction },
      );
    }
  }
}

function openIssue(organizationId: number, wellId: number, rule: RuleKey, f: Finding, lastSeen: number, isOngoing: boolean): Issue {
  const values = findingValues(f);
  return Issue.build(({
    organization_id: organizationId,
    well_id: wellId,
    rule,
    status: "new",
    severity: clampSeverity(f.severity),
    started_at: new Date(f.start),
    last_seen_at: new Date(lastSeen),
    ended_at: isOngoing ? null : new Date(lastSeen),
    ...values,
  }) as unknown as IssueCreate);
}

/** Extend a live issue with one finding (see the header for the rules). */
function extendIssue(issue: Issue, w: { patch: Patch; events: PendingEvent[] }, f: Finding, lastSeen: number, isOngoing: boolean, judgedFrom: number): void {
  const current = (key: keyof Patch) => (key in w.patch ? w.patch[key] : issue[key as keyof Issue]);
  const started = (current("started_at") as Date).getTime();
  if (f.start < started) setValue(issue, w.patch, "started_at", new Date(f.start));
  const severity = clampSeverity(f.severity);
  const before = current("severity") as number;
  if (severity > before) {
    setValue(issue, w.patch, "severity", severity);
    w.events.push({ kind: "severity_changed", from_status: null, to_status: null, data: { from: before, to: severity } });
  }
  const seen = (current("last_seen_at") as Date).getTime();
  // Only the newest view of the signature refreshes the words and the end state;
  // a re-run over older data leaves them alone, and so does a run over a shorter
  // window (the hourly sweep) that sees the same end but not the whole episode, or
  // sees it whole but without the data before it (a baseline cut short).
  if (lastSeen > seen || (lastSeen === seen && f.start <= started && f.start >= judgedFrom)) {
    if (lastSeen > seen) setValue(issue, w.patch, "last_seen_at", new Date(lastSeen));
    setValue(issue, w.patch, "ended_at", isOngoing ? null : new Date(lastSeen));
    for (const [k, v] of Object.entries(findingValues(f))) setValue(issue, w.patch, k as keyof Patch, v as never);
  }
}

function findingValues(f: Finding) {
  const risk = f.productionAtRisk;
  return {
    confidence: Number.isFinite(f.confidence) ? f.confidence : 0,
    summary: f.summary,
    evidence: toJson(f.evidence),
    annotations: toJson(f.annotations),
    production_at_risk: risk && Number.isFinite(risk.value) ? Math.max(0, risk.value) : 0,
    production_at_risk_unit: risk?.unit ?? "bbl/d",
    production_at_risk_method: risk?.method ?? null,
  };
}

function clampSeverity(s: number): number {
  return Number.isFinite(s) ? Math.max(0, Math.min(100, Math.round(s))) : 0;
}

/** Record a change only when the value really differs from what is stored. */
function setValue<K extends keyof Patch>(issue: Issue, patch: Patch, key: K, value: Patch[K]): void {
  const stored = issue.get(key as keyof Issue) as unknown;
  if (isSameValue(stored, value)) {
    delete patch[key];
    return;
  }
  patch[key] = value;
}

function isSameValue(a: unknown, b: unknown): boolean {
  if (a instanceof Date || b instanceof Date) {
    return a instanceof Date && b instanceof Date ? a.getTime() === b.getTime() : a === b;
  }
  if (typeof a === "object" || typeof b === "object") return isSameJson(a, b);
  return a === b;
}
