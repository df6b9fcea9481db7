// What a trend needs of its well: the pad (for field events) and the valve design
// (for the valve lines), in one plain query. getWell builds the full well page
// (pad and field names, mandrel ids, model instances in three queries); the chart
// asks on every draw, and that cost a few ms of CPU per request under the dashboard
// bench. The same organization scoping: another organization's well answers 404.
import { QueryTypes } from "sequelize";
import { sequelize } from "@/models";
import { notFound } from "@/lib/errors";
import type { WellDesign } from "@/lib/gaslift/types";

export interface TrendWell {
  id: number;
  padId: number;
  design: WellDesign;
}

// Column names become WellDesign's and Mandrel's (lib/gaslift/types.ts) in SQL; the
// mandrels come top to bottom, as toDesign (lib/services/wells/well-dto.ts) orders them.
const TREND_WELL_SQL = `
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
  ), '[]'::json)) AS design
FROM wells w
WHERE w.id = $1 AND w.organization_id = $2`;

/** The well's pad and valve design, within the organization; 404 otherwise. */
export async function readTrendWell(organizationId: number, wellId: number): Promise<TrendWell> {
  if (!Number.isInteger(wellId) || wellId <= 0) throw notFound("Well not found");
  const [row] = await sequelize.query<TrendWell>(TREND_WELL_SQL, { type: QueryTypes.SELECT, bind: [wellId, organizationId] });
  if (!row) throw notFound("Well not found");
  return row;
}
