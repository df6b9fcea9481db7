// The time windows drawn over a well's trend: its issues and its pad's field events
// that overlap the shown range, as plain objects. Plain SELECTs (no model instances):
// the chart asks for these on every draw, and building instances cost more than the
// queries themselves (measured under the dashboard bench).
import { QueryTypes } from "sequelize";
import { sequelize } from "@/models";
import { LIVE_STATUSES } from "@/models/issue";
import { labelFieldEvent, labelRule } from "@/lib/trends/rule-label";
import type { TrendFieldEvent, TrendIssueWindow } from "@/lib/trends/trend-types";

interface Scope {
  organizationId: number;
  wellId: number;
  fromMs: number;
  toMs: number;
}

const overlaps = (start: number, end: number | null, s: Scope) => start <= s.toMs && (end === null || end >= s.fromMs);

// Times leave the database as epoch ms (float8), so no Date objects are built per row.
const ms = (col: string) => `date_part('epoch', ${col}) * 1000`;

export async function listIssueWindows(s: Scope): Promise<TrendIssueWindow[]> {
  const rows = await sequelize.query<{ id: number; rule: string; status: string; started: number; ended: number | null; last_seen: number }>(
    `SELECT id, rule, status, ${ms("started_at")} AS started, ${ms("ended_at")} AS ended, ${ms("last_seen_at")} AS last_seen
     FROM issues
     WHERE organization_id = $1 AND well_id = $2 AND started_at <= $3 AND (ended_at IS NULL OR ended_at >= $4)
     ORDER BY started_at, id`,
    { type: QueryTypes.SELECT, bind: [s.organizationId, s.wellId, new Date(s.toMs), new Date(s.fromMs)] },
  );
  return rows
    .map((r) => {
      // A closed issue without an end time ended when the signature was last seen.
      const isLive = (LIVE_STATUSES as string[]).includes(r.status);
      const end = r.ended !== null ? Math.round(r.ended) : isLive ? null : Math.round(r.last_seen);
      return { id: r.id, rule: r.rule, label: labelRule(r.rule), start: Math.round(r.started), end, status: r.status };
    })
    .filter((w) => overlaps(w.start, w.end, s));
}

export async function listFieldEventWindows(s: Scope & { padId: number }): Promise<TrendFieldEvent[]> {
  const rows = await sequelize.query<{ id: number; kind: string; started: number; ended: number | null; summary: string }>(
    `SELECT id, kind, ${ms("started_at")} AS started, ${ms("ended_at")} AS ended, summary
     FROM field_events
     WHERE organization_id = $1 AND pad_id = $2 AND started_at <= $3 AND (ended_at IS NULL OR ended_at >= $4)
     ORDER BY started_at, id`,
    { type: QueryTypes.SELECT, bind: [s.organizationId, s.padId, new Date(s.toMs), new Date(s.fromMs)] },
  );
  return rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    label: labelFieldEvent(r.kind),
    start: Math.round(r.started),
    end: r.ended === null ? null : Math.round(r.ended),
    summary: r.summary,
  }));
}
