// What a trend needs besides its samples, in one statement: the well's pad and valve
// design (for the valve lines), its issues and its pad's field events that overlap
// the range (the shaded windows). One round trip instead of three: the chart asks on
// every draw, and each small statement costs ~0.3 ms of Node CPU in the round trip
// alone (measured here). Another organization's well answers 404.
import type pg from "pg";
import { notFound } from "@/lib/errors";
import { LIVE_STATUSES } from "@/models/issue";
import type { WellDesign } from "@/lib/gaslift/types";
import { labelFieldEvent, labelRule } from "@/lib/trends/rule-label";
import type { TrendFieldEvent, TrendIssueWindow } from "@/lib/trends/trend-types";

export interface TrendContext {
  wellId: number;
  padId: number;
  design: WellDesign;
  issues: TrendIssueWindow[];
  fieldEvents: TrendFieldEvent[];
}

export interface TrendScope {
  organizationId: number;
  wellId: number;
  fromMs: number;
  toMs: number;
}

// Times leave the database as epoch ms (float8), so no Date objects are built per row.
const ms = (col: string) => `date_part('epoch', ${col}) * 1000`;

// Column names become WellDesign's and Mandrel's (lib/gaslift/types.ts) in SQL; the
// mandrels come top to bottom, as toDesign (lib/services/wells/well-dto.ts) orders them.
const CONTEXT_SQL = `
SELECT w.id, w.pad_id AS "padId", json_build_object(
  'tubingIdIn', w.tubing_id_in, 'tubingDepthFt', w.tubing_depth_ft, 'perfDepthFt', w.perf_depth_ft,
  'surfaceTempF', w.surface_temp_f, 'bottomholeTempF', w.bottomhole_temp_f, 'gasSg', w.gas_sg,
  'liquidType', w.liquid_type, 'liquidGravity', w.liquid_gravity, 'waterCut', w.water_cut,
  'reservoirPressurePsig', w.reservoir_pressure_psig, 'injectionPressurePsig', w.injection_pressure_psig,
  'mandrels', coalesce((
    SELECT json_agg(json_build_object(
      'position', m.position, 'mdFt', m.md_ft, 'tvdFt', m.tvd_ft, 'kind', m.kind, 'portIn', m.port_in,
      'valveOdIn', m.valve_od_in, 'rRatio', m.r_ratio, 'tropsig', m.tro_psig) ORDER BY m.position)
    FROM mandrels m WHERE m.well_id = w.id AND m.organization_id = w.organization_id
  ), '[]'::json)) AS design,
  coalesce((
    SELECT json_agg(json_build_object('id', i.id, 'rule', i.rule, 'status', i.status,
      'started', ${ms("i.started_at")}, 'ended', ${ms("i.ended_at")}, 'lastSeen', ${ms("i.last_seen_at")}) ORDER BY i.started_at, i.id)
    FROM issues i
    WHERE i.organization_id = w.organization_id AND i.well_id = w.id AND i.started_at <= $3 AND (i.ended_at IS NULL OR i.ended_at >= $4)
  ), '[]'::json) AS issues,
  coalesce((
    SELECT json_agg(json_build_object('id', f.id, 'kind', f.kind, 'summary', f.summary,
      'started', ${ms("f.started_at")}, 'ended', ${ms("f.ended_at")}) ORDER BY f.started_at, f.id)
    FROM field_events f
    WHERE f.organization_id = w.organization_id AND f.pad_id = w.pad_id AND f.started_at <= $3 AND (f.ended_at IS NULL OR f.ended_at >= $4)
  ), '[]'::json) AS events
FROM wells w
WHERE w.id = $1 AND w.organization_id = $2`;

interface ContextRow {
  id: number;
  padId: number;
  design: WellDesign;
  issues: { id: number; rule: string; status: string; started: number; ended: number | null; lastSeen: number }[];
  events: { id: number; kind: string; summary: string; started: number; ended: number | null }[];
}

const overlaps = (start: number, end: number | null, s: TrendScope) => start <= s.toMs && (end === null || end >= s.fromMs);

function toIssueWindow(r: ContextRow["issues"][number]): TrendIssueWindow {
  // A closed issue without an end time ended when the signature was last seen.
  const isLive = (LIVE_STATUSES as string[]).includes(r.status);
  const end = r.ended !== null ? Math.round(r.ended) : isLive ? null : Math.round(r.lastSeen);
  return { id: r.id, rule: r.rule, label: labelRule(r.rule), start: Math.round(r.started), end, status: r.status };
}

function toFieldEvent(r: ContextRow["events"][number]): TrendFieldEvent {
  return { id: r.id, kind: r.kind, label: labelFieldEvent(r.kind), start: Math.round(r.started), end: r.ended === null ? null : Math.round(r.ended), summary: r.summary };
}

/** The well's pad, valve design, issue windows and field events over the range, within the organization; 404 otherwise. */
export async function readTrendContext(db: pg.Pool | pg.ClientBase, s: TrendScope): Promise<TrendContext> {
  if (!Number.isInteger(s.wellId) || s.wellId <= 0) throw notFound("Well not found");
  // A named (prepared) statement: planned once per pooled connection.
  const r = await db.query<ContextRow>({
    name: "bellows-trend-context",
    text: CONTEXT_SQL,
    values: [s.wellId, s.organizationId, new Date(s.toMs), new Date(s.fromMs)],
  });
  const row = r.rows[0];
  if (!row) throw notFound("Well not found");
  return {
    wellId: row.id,
    padId: row.padId,
    design: row.design,
    issues: row.issues.map(toIssueWindow).filter((w) => overlaps(w.start, w.end, s)),
    fieldEvents: row.events.map(toFieldEvent),
  };
}
