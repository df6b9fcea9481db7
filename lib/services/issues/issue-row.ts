// The ranked list's row and the SQL that builds it (shared by the list and the CSV export).
import { createHash } from "node:crypto";
import { getReadPool } from "@/lib/services/samples/sample-db";
import type { Actor } from "@/lib/auth/actor";
import { OPEN_STATUSES, ruleLabel, type IssueQuery, type IssueStatus } from "@/lib/validations/issues";

export interface IssueRow {
  id: number;
  wellId: number;
  wellName: string;
  fieldName: string;
  padName: string;
  rule: string;
  ruleLabel: string;
  severity: number;
  productionAtRisk: number;
  unit: string;
  since: string;
  durationHours: number;
  status: IssueStatus;
  assigneeId: number | null;
  assigneeName: string | null;
  priority: string | null;
  dueOn: string | null;
  lastChange: string;
}

// Sort keys over the issue (and, for the well's name, the well) only, so the page can
// be chosen before anything else is joined (see selectIssueRows).
const ORDER: Record<IssueQuery["sort"], string> = {
  risk: "i.production_at_risk {dir}, i.severity {dir}",
  severity: "i.severity {dir}, i.production_at_risk DESC",
  since: "i.started_at {dir}",
  duration: "(COALESCE(i.ended_at, now()) - i.started_at) {dir}",
  well: "w.name {dir}",
  status: "i.status {dir}",
  lastChange: "i.updated_at {dir}",
};

/**
 * The filter as SQL with $n parameters; operators only ever see their own issues.
 * The statuses are not in `where`: they are a parameter (`statuses`, e.g. "$2") that
 * the list and the count read one status at a time (see fromStatuses).
 */
export function buildIssueWhere(actor: Actor, q: IssueQuery): { where: string; values: unknown[]; statuses: string | null } {
  const values: unknown[] = [];
  const param = (v: unknown) => {
    values.push(v);
    return `$${values.length}`;
  };
  const parts = [`i.organization_id = ${param(actor.organizationId)}::int`];
  const statuses = q.status === "all" ? null : `${param(q.status ? q.status.split(",") : OPEN_STATUSES)}::enum_issues_status[]`;
  if (q.field) parts.push(`p.field_id = ${param(q.field)}::int`);
  if (q.pad) parts.push(`w.pad_id = ${param(q.pad)}::int`);
  if (q.rule) parts.push(`i.rule = ${param(q.rule)}::text`);
  if (q.since) parts.push(`i.started_at >= ${param(`${q.since}T00:00:00Z`)}::timestamptz`);
  if (q.assignee === "none") parts.push("i.assignee_id IS NULL");
  else if (q.assignee) parts.push(`i.assignee_id = ${param(q.assignee === "me" ? (actor.userId ?? -1) : Number(q.assignee))}::int`);
  if (actor.role === "operator") parts.push(`i.assignee_id = ${param(actor.userId ?? -1)}::int`);
  return { where: parts.join(" AND "), values, statuses };
}

/** The issues with the well and pad joined when the filter or the order names them. */
const issuesFrom = (needsWells: boolean) =>
  needsWells ? "issues i JOIN wells w ON w.id = i.well_id JOIN pads p ON p.id = w.pad_id" : "issues i";
const namesWells = (sql: string) => /\b(p|w)\./.test(sql);

/**
 * A FROM item (to be aliased): `select` over the filtered issues, run once per asked
 * status (a LATERAL join over the status list) so that each run is an equality on
 * (organization, status). The statements keep one plan for any parameters (the read
 * pool's generic plans), and for "organization = $1 AND status = ANY($2)" that plan
 * read all ~20,000 issues of the dashboard bench's organization through its
 * organization index (~20 ms), where one status at a time walks the (organization,
 * status, production at risk) index (~2 ms; EXPLAIN ANALYZE here).
 */
function fromStatuses(f: { where: string; statuses: string | null }, select: (where: string) => string): string {
  if (f.statuses === null) return `(${select(f.where)})`;
  return `unnest(${f.statuses}) AS s(status) CROSS JOIN LATERAL (${select(`${f.where} AND i.status = s.status`)})`;
}

// Every list query is a named (prepared) statement, one per shape of filter and
// order, so PostgreSQL plans each shape once per pooled connection: planning the
// five-table join cost more database time than running it (pgbench here: ~1.8–2.0
// against ~1.2 ms per page). The name is a hash of the text: this module is bundled
// more than once (pages and route handlers) and every copy shares the one pool, so a
// counter per copy gave one name to two texts on the same connection.
const names = new Map<string, string>();
function named(text: string, values: unknown[]) {
  let name = names.get(text);
  if (!name) names.set(text, (name = `bellows-issues-${createHash("sha256").update(text).digest("hex").slice(0, 24)}`));
  return { name, text, values };
}

interface RawRow {
  id: number; well_id: number; well_name: string; field_name: string; pad_name: string; rule: string; severity: number;
  production_at_risk: number; production_at_risk_unit: string; started_at: Date | string; duration_hours: number; status: IssueStatus;
  assignee_id: number | null; assignee_name: string | null; priority: string | null; due_on: string | null; updated_at: Date | string;
}

export async function selectIssueRows(actor: Actor, q: IssueQuery, limit: number, offset: number): Promise<IssueRow[]> {
  const f = buildIssueWhere(actor, q);
  const dir = q.dir === "asc" ? "ASC" : "DESC";
  const order = `${ORDER[q.sort].replaceAll("{dir}", dir)}, i.id ${dir}`;
  const [limitAt, offsetAt] = [`$${f.values.length + 1}::int`, `$${f.values.length + 2}::int`];
  const from = issuesFrom(namesWells(f.where) || namesWells(order));
  // The page is chosen from the issues first (joining wells and pads only when the
  // filter or order needs them), then only its rows are joined for their names:
  // joining all ~1,000 open issues of the dashboard bench before sorting cost ~1.2
  // against ~0.7–1.0 ms (pgbench here). Per status, the first limit + offset rows
  // in the order are enough to choose the page from.
  const page =
    f.statuses === null
      ? `SELECT i.* FROM ${from} WHERE ${f.where} ORDER BY ${order} LIMIT ${limitAt} OFFSET ${offsetAt}`
      : `SELECT i.* FROM ${fromStatuses(f, (where) => `SELECT i.* FROM ${from} WHERE ${where} ORDER BY ${order} LIMIT ${limitAt} + ${offsetAt}`)} i
         ${namesWells(order) ? "JOIN wells w ON w.id = i.well_id" : ""} ORDER BY ${order} LIMIT ${limitAt} OFFSET ${offsetAt}`;
  // Text and float8 casts: the answer is the same whatever type parsers the process
  // has registered (a date-only column would otherwise come back as a Date).
  const r = await getReadPool().query<RawRow>(
    named(
      `SELECT i.id, i.well_id, w.name AS well_name, f.name AS field_name, p.name AS pad_name, i.rule, i.severity,
            i.production_at_risk::float8 AS production_at_risk, i.production_at_risk_unit, i.started_at, i.status::text AS status,
            i.assignee_id, u.name AS assignee_name, i.priority::text AS priority, i.due_on::text AS due_on, i.updated_at,
            (date_part('epoch', COALESCE(i.ended_at, now()) - i.started_at) / 3600.0)::float8 AS duration_hours
       FROM (${page}) i
       JOIN wells w ON w.id = i.well_id
       JOIN pads p ON p.id = w.pad_id
       JOIN fields f ON f.id = p.field_id
       LEFT JOIN users u ON u.id = i.assignee_id
       ORDER BY ${order}`,
      [...f.values, limit, offset],
    ),
  );
  return r.rows.map((r) => ({
    id: r.id,
    wellId: r.well_id,
    wellName: r.well_name,
    fieldName: r.field_name,
    padName: r.pad_name,
    rule: r.rule,
    ruleLabel: ruleLabel(r.rule),
    severity: r.severity,
    productionAtRisk: Number(r.production_at_risk),
    unit: r.production_at_risk_unit,
    since: new Date(r.started_at).toISOString(),
    durationHours: Math.round(Number(r.duration_hours) * 10) / 10,
    status: r.status,
    assigneeId: r.assignee_id,
    assigneeName: r.assignee_name,
    priority: r.priority,
    dueOn: r.due_on,
    lastChange: new Date(r.updated_at).toISOString(),
  }));
}

export async function countIssueRows(actor: Actor, q: IssueQuery): Promise<number> {
  const f = buildIssueWhere(actor, q);
  const from = issuesFrom(namesWells(f.where));
  const text = `SELECT coalesce(sum(n), 0)::int AS n FROM ${fromStatuses(f, (where) => `SELECT count(*) AS n FROM ${from} WHERE ${where}`)} c`;
  const r = await getReadPool().query<{ n: number }>(named(text, f.values));
  return r.rows[0]?.n ?? 0;
}
