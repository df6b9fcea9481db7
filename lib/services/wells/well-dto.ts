// Plain objects for the UI and the rules; never Sequelize instances.
import type { Mandrel as MandrelRow, Well as WellRow } from "@/models";
import type { Mandrel, WellDesign } from "@/lib/gaslift/types";
import type { WellStatus } from "@/models/well";

export interface WellSummary {
  id: number;
  name: string;
  uwi: string;
  status: WellStatus;
  padId: number;
  padName: string;
  fieldId: number;
  fieldName: string;
  timeZone: string;
  mandrelCount: number;
  updatedAt: string;
}

export interface WellDetail extends WellSummary {
  design: WellDesign;
  mandrels: (Mandrel & { id: number; installedOn: string | null })[];
}

export function toMandrel(m: MandrelRow): Mandrel & { id: number; installedOn: string | null } {
  return {
    id: m.id,
    position: m.position,
    mdFt: m.md_ft,
    tvdFt: m.tvd_ft,
    kind: m.kind,
    portIn: m.port_in,
    valveOdIn: m.valve_od_in,
    rRatio: m.r_ratio,
    tropsig: m.tro_psig,
    installedOn: m.installed_on,
  };
}

export function toDesign(w: WellRow, mandrels: Mandrel[]): WellDesign {
  return {
    tubingIdIn: w.tubing_id_in,
    tubingDepthFt: w.tubing_depth_ft,
    perfDepthFt: w.perf_depth_ft,
    surfaceTempF: w.surface_temp_f,
    bottomholeTempF: w.bottomhole_temp_f,
    gasSg: w.gas_sg,
    liquidType: w.liquid_type,
    liquidGravity: w.liquid_gravity,
    waterCut: w.water_cut,
    reservoirPressurePsig: w.reservoir_pressure_psig,
    injectionPressurePsig: w.injection_pressure_psig,
    mandrels: [...mandrels].sort((a, b) => a.position - b.position),
  };
}

/** Well form values (camelCase) to table columns. */
export function wellColumns(input: {
  name: string; uwi: string; padId: number; status: WellStatus; timeZone: string;
  tubingIdIn: number; tubingDepthFt: number; perfDepthFt: number; surfaceTempF: number; bottomholeTempF: number;
  gasSg: number; liquidType: "oil" | "water" | "condensate"; liquidGravity: number; waterCut: number;
  reservoirPressurePsig: number; injectionPressurePsig: number;
}) {
  return {
    name: input.name,
    uwi: input.uwi,
    pad_id: input.padId,
    status: input.status,
    time_zone: input.timeZone,
    tubing_id_in: input.tubingIdIn,
    tubing_depth_ft: input.tubingDepthFt,
    perf_depth_ft: input.perfDepthFt,
    surface_temp_f: input.surfaceTempF,
    bottomhole_temp_f: input.bottomholeTempF,
    gas_sg: input.gasSg,
    liquid_type: input.liquidType,
    liquid_gravity: input.liquidGravity,
    water_cut: input.waterCut,
    reservoir_pressure_psig: input.reservoirPressurePsig,
    injection_pressure_psig: input.injectionPressurePsig,
  };
}

export function mandrelColumns(m: {
  position: number; mdFt: number; tvdFt: number; kind: "ipo" | "orifice" | "dummy";
  portIn: number | null; valveOdIn: number | null; rRatio: number | null; tropsig: number | null; installedOn?: string | null;
}) {
  return {
    position: m.position,
    md_ft: m.mdFt,
    tvd_ft: m.tvdFt,
    kind: m.kind,
    port_in: m.portIn,
    valve_od_in: m.valveOdIn,
    r_ratio: m.rRatio,
    tro_psig: m.tropsig,
    installed_on: m.installedOn ?? null,
  };
}
