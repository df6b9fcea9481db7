import { QueryTypes } from "sequelize";
import { sequelize } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { OPEN_STATUSES, ruleLabel } from "@/lib/validations/issues";

export interface IssueSummary {
  wellsMonitored: number;
  wellsWithOpenIssues: number;
  wellsByRule: { rule: string; ruleLabel: string; wells: number }[];
  productionAtRisk: { unit: string; value: number }[];
  openedThisWeek: number;
  resolvedThisWeek: number;
  /** Open issues at the end of each of the last 30 days (UTC), oldest first. */
  openPerDay: { day: string; open: number }[];
}

/** The tiles above the ranked list. Operators get the same figures over their own issues. */
export async function getIssueSummary(actor: Actor): Promise<IssueSummary> {
  requireCapability(actor, "issues.read");
  const mine = actor.role === "operator" ? " AND i.assignee_id = :me" : "";
  const r = { org: actor.organizationId, open: OPEN_STATUSES, me: actor.userId ?? -1 };
  const q = <T extends object>(sql: string) => sequelize.query<T>(sql, { type: QueryTypes.SELECT, replacements: r });
  // "This week" is the last seven days, so Monday's screen is not empty.
  const [wells, byRule, anyOpen, risk, week, perDay] = await Promise.all([
    q<{ n: string }>(`SELECT COUNT(*) AS n FROM wells WHERE organization_id = :org`),
    q<{ rule: string; n: string }>(`SELECT i.rule, COUNT(DISTINCT i.well_id) AS n FROM issues i WHERE i.organization_id = :org AND i.status IN (:open)${mine} GROUP BY i.rule ORDER BY n DESC`),
    q<{ n: string }>(`SELECT COUNT(DISTINCT i.well_id) AS n FROM issues i WHERE i.organization_id = :org AND i.status IN (:open)${mine}`),
    q<{ unit: string; v: number }>(`SELECT i.production_at_risk_unit AS unit, SUM(i.production_at_risk) AS v FROM issues i WHERE i.organization_id = :org AND i.status IN (:open)${mine} GROUP BY 1 ORDER BY 1`),
    q<{ opened: string; resolved: string }>(
      `SELECT COUNT(*) FILTER (WHERE i.created_at >= now() - interval '7 days') AS opened,
              COUNT(*) FILTER (WHERE i.resolved_at >= now() - interval '7 days') AS resolved
       FROM issues i WHERE i.organization_id = :org AND (i.created_at >= now() - interval '7 days' OR i.resolved_at >= now() - interval '7 days')${mine}`,
    ),
    // An issue counts as open at a day's end if it started before then and was not yet closed
    // (resolved/verified/dismissed: closed at resolved_at, else at its last update).
    q<{ day: string; open: string }>(
      `WITH days AS (SELECT generate_series(date_trunc('day', now() AT TIME ZONE 'UTC') - interval '29 days', date_trunc('day', now() AT TIME ZONE 'UTC'), interval '1 day') AS d),
            spans AS (SELECT i.started_at AS a,
                             CASE WHEN i.status IN ('resolved','verified','dismissed') THEN COALESCE(i.resolved_at, i.updated_at) END AS b
                      FROM issues i WHERE i.organization_id = :org${mine})
       SELECT to_char(days.d, 'YYYY-MM-DD') AS day,
              (SELECT COUNT(*) FROM spans WHERE spans.a < (days.d + interval '1 day') AT TIME ZONE 'UTC'
                 AND (spans.b IS NULL OR spans.b >= (days.d + interval '1 day') AT TIME ZONE 'UTC')) AS open
       FROM days ORDER BY days.d`,
    ),
  ]);
  return {
    wellsMonitored: Number(wells[0]?.n ?? 0),
    wellsWithOpenIssues: Number(anyOpen[0]?.n ?? 0),
    wellsByRule: byRule.map((x) => ({ rule: x.rule, ruleLabel: ruleLabel(x.rule), wells: Number(x.n) })),
    productionAtRisk: risk.map((x) => ({ unit: x.unit, value: Math.round(Number(x.v) * 10) / 10 })),
    openedThisWeek: Number(week[0]?.opened ?? 0),
    resolvedThisWeek: Number(week[0]?.resolved ?? 0),
    openPerDay: perDay.map((x) => ({ day: x.day, open: Number(x.open) })),
  };
}
