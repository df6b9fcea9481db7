// Parsing of well-register CSV files (wells, or valve designs) into validated
// rows with row/column errors. Pure: the service decides what to write.
import Papa from "papaparse";
import { MandrelSchema, WellSchema } from "./well";

export type RegisterCsvKind = "wells" | "valves";

export const WELL_CSV_COLUMNS = [
  "uwi", "name", "field", "pad", "status", "time_zone", "tubing_id_in", "tubing_depth_ft", "perf_depth_ft",
  "surface_temp_f", "bottomhole_temp_f", "gas_sg", "liquid_type", "liquid_gravity", "water_cut",
  "reservoir_pressure_psig", "injection_pressure_psig",
] as const;

export const VALVE_CSV_COLUMNS = [
  "uwi", "position", "md_ft", "tvd_ft", "kind", "port_in", "valve_od_in", "r_ratio", "tro_psig", "installed_on",
] as const;

const WELL_KEYS: Record<string, string> = {
  tubing_id_in: "tubingIdIn", tubing_depth_ft: "tubingDepthFt", perf_depth_ft: "perfDepthFt",
  surface_temp_f: "surfaceTempF", bottomhole_temp_f: "bottomholeTempF", gas_sg: "gasSg", liquid_type: "liquidType",
  liquid_gravity: "liquidGravity", water_cut: "waterCut", reservoir_pressure_psig: "reservoirPressurePsig",
  injection_pressure_psig: "injectionPressurePsig", time_zone: "timeZone", name: "name", uwi: "uwi", status: "status",
};
const VALVE_KEYS: Record<string, string> = {
  position: "position", md_ft: "mdFt", tvd_ft: "tvdFt", kind: "kind", port_in: "portIn", valve_od_in: "valveOdIn",
  r_ratio: "rRatio", tro_psig: "tropsig", installed_on: "installedOn",
};

export interface CsvRowError {
  row: number;
  column: string;
  message: string;
  /** The well identifier of the row, when it has one (valve files). */
  key?: string;
}

export interface ParsedWellRow { row: number; field: string; pad: string; well: ReturnType<typeof WellSchema.parse> }
export interface ParsedValveRow { row: number; uwi: string; mandrel: ReturnType<typeof MandrelSchema.parse> }

export type ParsedRegisterCsv =
  | { kind: "wells"; rows: ParsedWellRow[]; errors: CsvRowError[] }
  | { kind: "valves"; rows: ParsedValveRow[]; errors: CsvRowError[] };

const camelToColumn = (map: Record<string, string>, key: string) =>
  Object.entries(map).find(([, v]) => v === key)?.[0] ?? key;

/** Parse the text of a register CSV. Row numbers are file lines (header = 1). */
export function parseRegisterCsv(text: string, fileName = "file"): ParsedRegisterCsv {
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), {
    header: true,
    skipEmptyLines: "greedy",
    transformHeader: (h) => h.trim().toLowerCase(),
  });
  const headers = parsed.meta.fields ?? [];
  const errors: CsvRowError[] = parsed.errors.map((e) => ({ row: (e.row ?? 0) + 2, column: "", message: `${fileName}: ${e.message}` }));
  const kind: RegisterCsvKind | null = headers.includes("position") ? "valves" : headers.includes("tubing_depth_ft") ? "wells" : null;
  if (!kind) {
    return {
      kind: "valves",
      rows: [],
      errors: [{ row: 1, column: "", message: `${fileName}: the header must name the columns of a well list (${WELL_CSV_COLUMNS.join(", ")}) or of a valve design (${VALVE_CSV_COLUMNS.join(", ")})` }],
    };
  }
  const expected = kind === "wells" ? WELL_CSV_COLUMNS : VALVE_CSV_COLUMNS;
  const missing = expected.filter((c) => !headers.includes(c) && c !== "installed_on" && c !== "r_ratio");
  if (missing.length) {
    errors.push({ row: 1, column: missing.join(", "), message: `${fileName}: missing column(s) ${missing.join(", ")}` });
    return kind === "wells" ? { kind, rows: [], errors } : { kind, rows: [], errors };
  }

  if (kind === "wells") {
    const rows: ParsedWellRow[] = [];
    parsed.data.forEach((raw, i) => {
      const row = i + 2;
      const obj: Record<string, unknown> = { padId: 1 };
      for (const [col, key] of Object.entries(WELL_KEYS)) obj[key] = raw[col]?.trim();
      const r = WellSchema.safeParse(obj);
      if (!raw.field?.trim()) errors.push({ row, column: "field", message: "Enter the field name" });
      if (!raw.pad?.trim()) errors.push({ row, column: "pad", message: "Enter the pad name" });
      if (!r.success) {
        for (const issue of r.error.issues) errors.push({ row, column: camelToColumn(WELL_KEYS, String(issue.path[0] ?? "")), message: issue.message });
      } else if (raw.field?.trim() && raw.pad?.trim()) {
        rows.push({ row, field: raw.field.trim(), pad: raw.pad.trim(), well: r.data });
      }
    });
    return { kind, rows, errors };
  }

  const rows: ParsedValveRow[] = [];
  parsed.data.forEach((raw, i) => {
    const row = i + 2;
    const obj: Record<string, unknown> = {};
    for (const [col, key] of Object.entries(VALVE_KEYS)) obj[key] = raw[col]?.trim() ?? "";
    const uwi = raw.uwi?.trim() ?? "";
    if (!uwi) errors.push({ row, column: "uwi", message: "Enter the well identifier" });
    const r = MandrelSchema.safeParse(obj);
    if (!r.success) {
      for (const issue of r.error.issues) {
        errors.push({ row, column: camelToColumn(VALVE_KEYS, String(issue.path[0] ?? "")), message: issue.message, ...(uwi ? { key: uwi } : {}) });
      }
    } else if (uwi) {
      rows.push({ row, uwi, mandrel: r.data });
    }
  });
  return { kind, rows, errors };
}
