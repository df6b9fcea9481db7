// The time windows drawn over a well's trend: its issues and its pad's field events
// that overlap the shown range, as plain objects.
import { Op } from "sequelize";
import { FieldEvent, Issue } from "@/models";
import { LIVE_STATUSES } from "@/models/issue";
import { labelFieldEvent, labelRule } from "@/lib/trends/rule-label";
import type { TrendFieldEvent, TrendIssueWindow } from "@/lib/trends/trend-types";

interface Scope {
  organizationId: number;
  wellId: number;
  padId: number;
  fromMs: number;
  toMs: number;
}

const overlaps = (start: number, end: number | null, s: Scope) => start <= s.toMs && (end === null || end >= s.fromMs);

export async function listIssueWindows(s: Scope): Promise<TrendIssueWindow[]> {
  const rows = await Issue.findAll({
    attributes: ["id", "rule", "status", "started_at", "ended_at", "last_seen_at"],
    where: {
      organization_id: s.organizationId,
      well_id: s.wellId,
      started_at: { [Op.lte]: new Date(s.toMs) },
      [Op.or]: [{ ended_at: null }, { ended_at: { [Op.gte]: new Date(s.fromMs) } }],
    },
    order: [["started_at", "ASC"], ["id", "ASC"]],
  });
  return rows
    .map((r) => {
      // A closed issue without an end time ended when the signature was last seen.
      const isLive = (LIVE_STATUSES as string[]).includes(r.status);
      const end = r.ended_at?.getTime() ?? (isLive ? null : r.last_seen_at.getTime());
      return { id: r.id, rule: r.rule, label: labelRule(r.rule), start: r.started_at.getTime(), end, status: r.status };
    })
    .filter((w) => overlaps(w.start, w.end, s));
}

export async function listFieldEventWindows(s: Scope): Promise<TrendFieldEvent[]> {
  const rows = await FieldEvent.findAll({
    where: {
      organization_id: s.organizationId,
      pad_id: s.padId,
      started_at: { [Op.lte]: new Date(s.toMs) },
      [Op.or]: [{ ended_at: null }, { ended_at: { [Op.gte]: new Date(s.fromMs) } }],
    },
    order: [["started_at", "ASC"], ["id", "ASC"]],
  });
  return rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    label: labelFieldEvent(r.kind),
    start: r.started_at.getTime(),
    end: r.ended_at?.getTime() ?? null,
    summary: r.summary,
  }));
}
