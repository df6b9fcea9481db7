// The ranked list's row and the SQL that builds it (shared by the list and the CSV export).
import { QueryTypes } from "sequelize";
import { sequelize } from "@/models";
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

const ORDER: Record<IssueQuery["sort"], string> = {
  risk: "i.production_at_risk {dir}, i.severity {dir}",
  severity: "i.severity {dir}, i.production_at_risk DESC",
  since: "i.started_at {dir}",
  duration: "duration_hours {dir}",
  well: "w.name {dir}",
  status: "i.status {dir}",
  lastChange: "i.updated_at {dir}",
};

/** WHERE clause and replacements for a query; operators only ever see their own issues. */
export function buildIssueWhere(actor: Actor, q: IssueQuery): { where: string; replacements: Record<string, unknown> } {
  const parts = ["i.organization_id = :org"];
  const replacements: Record<string, unknown> = { org: actor.organizationId };
  if (q.status !== "all") {
    parts.push("i.status IN (:statuses)");
    replacements.statuses = q.status ? q.status.split(",") : OPEN_STATUSES;
  }
  if (q.field) { parts.push("p.field_id = :field"); replacements.field = q.field; }
  if (q.pad) { parts.push("w.pad_id = :pad"); replacements.pad = q.pad; }
  if (q.rule) { parts.push("i.rule = :rule"); replacements.rule = q.rule; }
  if (q.since) { parts.push("i.started_at >= :since"); replacements.since = `${q.since}T00:00:00Z`; }
  if (q.assignee === "none") parts.push("i.assignee_id IS NULL");
  else if (q.assignee) { parts.push("i.assignee_id = :assignee"); replacements.assignee = q.assignee === "me" ? (actor.userId ?? -1) : Number(q.assignee); }
  if (actor.role === "operator") { parts.push("i.assignee_id = :me"); replacements.me = actor.userId ?? -1; }
  return { where: parts.join(" AND "), replacements };
}

const FROM = `FROM issues i
  JOIN wells w ON w.id = i.well_id
  JOIN pads p ON p.id = w.pad_id
  JOIN fields f ON f.id = p.field_id
  LEFT JOIN users u ON u.id = i.assignee_id`;

interface RawRow {
  id: number; well_id: number; well_name: string; field_name: string; pad_name: string; rule: string; severity: number;
  production_at_risk: number; production_at_risk_unit: string; started_at: Date; duration_hours: string | number; status: IssueStatus;
  assignee_id: number | null; assignee_name: string | null; priority: string | null; due_on: string | null; updated_at: Date;
}

export async function selectIssueRows(actor: Actor, q: IssueQuery, limit: number, offset: number): Promise<IssueRow[]> {
  const { where, replacements } = buildIssueWhere(actor, q);
  const dir = q.dir === "asc" ? "ASC" : "DESC";
  const order = `${ORDER[q.sort].replaceAll("{dir}", dir)}, i.id ${dir}`;
  const rows = await sequelize.query<RawRow>(
    `SELECT i.id, i.well_id, w.name AS well_name, f.name AS field_name, p.name AS pad_name, i.rule, i.severity,
            i.production_at_risk, i.production_at_risk_unit, i.started_at, i.status, i.assignee_id, u.name AS assignee_name,
            i.priority, i.due_on, i.updated_at,
            EXTRACT(EPOCH FROM (COALESCE(i.ended_at, now()) - i.started_at)) / 3600.0 AS duration_hours
     ${FROM} WHERE ${where} ORDER BY ${order} LIMIT :limit OFFSET :offset`,
    { type: QueryTypes.SELECT, replacements: { ...replacements, limit, offset } },
  );
  return rows.map((r) => ({
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
  const { where, replacements } = buildIssueWhere(actor, q);
  const needsJoins = /\b(p|w)\./.test(where);
  const from = needsJoins ? "FROM issues i JOIN wells w ON w.id = i.well_id JOIN pads p ON p.id = w.pad_id" : "FROM issues i";
  const [r] = await sequelize.query<{ n: string }>(`SELECT COUNT(*) AS n ${from} WHERE ${where}`, { type: QueryTypes.SELECT, replacements });
  return Number(r?.n ?? 0);
}
