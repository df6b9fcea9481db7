// One schema for the well register, shared by the forms (client), the server
// actions and the CSV import. Values are canonical oilfield units; forms in
// metric convert before validating. Ranges are plausible-for-the-trade bounds,
// not design limits (common practice; chosen by us).
import { z } from "zod";

const num = (label: string, min: number, max: number, unit: string) =>
  z.coerce
    .number({ error: `${label} must be a number` })
    .refine(Number.isFinite, `${label} must be a number`)
    .refine((v) => v >= min && v <= max, `${label} must be between ${min} and ${max} ${unit}`);

const optionalNum = (label: string, min: number, max: number, unit: string) =>
  z.preprocess((v) => (v === "" || v === undefined ? null : v), num(label, min, max, unit).nullable());

export const WELL_STATUSES = ["producing", "kicking_off", "shut_in", "suspended"] as const;
export const WELL_STATUS_LABEL: Record<(typeof WELL_STATUSES)[number], string> = {
  producing: "Producing",
  kicking_off: "Kicking off",
  shut_in: "Shut in",
  suspended: "Suspended",
};

export const TimeZoneSchema = z.string().refine((tz) => {
  try {
    new Intl.DateTimeFormat("en", { timeZone: tz });
    return true;
  } catch {
    return false;
  }
}, "Unknown time zone (use an IANA name such as America/Chicago)");

export const WellSchema = z
  .object({
    name: z.string().trim().min(1, "Enter the well name").max(120),
    uwi: z.string().trim().min(1, "Enter the well identifier").max(40).regex(/^[A-Za-z0-9._/-]+$/, "Use letters, digits and . _ / - only"),
    padId: z.coerce.number().int().positive("Choose a pad"),
    status: z.enum(WELL_STATUSES),
    timeZone: TimeZoneSchema,
    tubingIdIn: num("Tubing inner diameter", 0.8, 7, "in"),
    tubingDepthFt: num("Tubing depth", 500, 30000, "ft"),
    perfDepthFt: num("Perforation depth", 500, 30000, "ft"),
    surfaceTempF: num("Surface temperature", -40, 200, "°F"),
    bottomholeTempF: num("Bottom-hole temperature", 32, 450, "°F"),
    gasSg: num("Injection gas specific gravity", 0.55, 1.5, ""),
    liquidType: z.enum(["oil", "water", "condensate"]),
    liquidGravity: num("Liquid gravity", 0.5, 70, "(°API or SG)"),
    waterCut: num("Water cut", 0, 1, "(fraction)"),
    reservoirPressurePsig: num("Reservoir static pressure", 0, 20000, "psig"),
    injectionPressurePsig: num("Available injection pressure", 50, 5000, "psig"),
  })
  .superRefine((w, ctx) => {
    if (w.tubingDepthFt > w.perfDepthFt + 500) {
      ctx.addIssue({ code: "custom", path: ["tubingDepthFt"], message: "Tubing depth is more than 500 ft below the perforations" });
    }
    if (w.bottomholeTempF <= w.surfaceTempF) {
      ctx.addIssue({ code: "custom", path: ["bottomholeTempF"], message: "Bottom-hole temperature must be above surface temperature" });
    }
  });

export type WellInput = z.infer<typeof WellSchema>;

export const MandrelSchema = z
  .object({
    position: z.coerce.number().int().min(1).max(40),
    mdFt: num("Measured depth", 50, 30000, "ft"),
    tvdFt: num("True vertical depth", 50, 30000, "ft"),
    kind: z.enum(["ipo", "orifice", "dummy"], { error: "Valve kind must be ipo, orifice or dummy" }),
    portIn: optionalNum("Port size", 0.0625, 1, "in"),
    valveOdIn: optionalNum("Valve size", 1, 1.5, "in"),
    rRatio: optionalNum("Bellows area ratio R", 0.01, 0.5, ""),
    tropsig: optionalNum("Test-rack opening pressure", 100, 3000, "psig"),
    installedOn: z.preprocess((v) => (v === "" ? null : v), z.iso.date("Install date must be YYYY-MM-DD").nullable().optional()),
  })
  .superRefine((m, ctx) => {
    if (m.tvdFt > m.mdFt + 1) ctx.addIssue({ code: "custom", path: ["tvdFt"], message: "True vertical depth cannot exceed measured depth" });
    if (m.kind !== "dummy" && m.portIn == null) ctx.addIssue({ code: "custom", path: ["portIn"], message: "Port size is needed for a valve or orifice" });
    if (m.kind === "ipo") {
      if (m.tropsig == null) ctx.addIssue({ code: "custom", path: ["tropsig"], message: "An unloading valve needs its test-rack opening pressure" });
      if (m.rRatio == null && m.valveOdIn == null) ctx.addIssue({ code: "custom", path: ["valveOdIn"], message: "Give the valve size or the bellows area ratio R" });
      if (m.valveOdIn != null && m.valveOdIn !== 1 && m.valveOdIn !== 1.5) ctx.addIssue({ code: "custom", path: ["valveOdIn"], message: "Valve size must be 1 or 1.5 in" });
    }
  });

export type MandrelInput = z.infer<typeof MandrelSchema>;

/** A valve string, top to bottom: positions 1..n, depths increasing. */
export const ValveStringSchema = z.array(MandrelSchema).superRefine((list, ctx) => {
  const sorted = [...list].sort((a, b) => a.position - b.position);
  sorted.forEach((m, i) => {
    if (m.position !== i + 1) ctx.addIssue({ code: "custom", path: [i, "position"], message: `Positions must run 1, 2, 3… (found ${m.position} at place ${i + 1})` });
    const prev = sorted[i - 1];
    if (prev && m.mdFt <= prev.mdFt) ctx.addIssue({ code: "custom", path: [i, "mdFt"], message: `Mandrel ${m.position} must be deeper than mandrel ${prev.position}` });
    if (prev && m.tvdFt < prev.tvdFt) ctx.addIssue({ code: "custom", path: [i, "tvdFt"], message: `Mandrel ${m.position} TVD must not be shallower than mandrel ${prev.position}` });
  });
});

export const WellFilterSchema = z.object({
  q: z.string().trim().max(100).optional(),
  fieldId: z.coerce.number().int().positive().optional(),
  padId: z.coerce.number().int().positive().optional(),
  status: z.enum(WELL_STATUSES).optional(),
  sort: z.enum(["name", "uwi", "field", "pad", "status", "updated"]).default("name"),
  dir: z.enum(["asc", "desc"]).default("asc"),
});
export type WellFilter = z.infer<typeof WellFilterSchema>;

export const FieldSchema = z.object({ name: z.string().trim().min(1, "Enter a field name").max(120), timeZone: TimeZoneSchema });
export const PadSchema = z.object({ name: z.string().trim().min(1, "Enter a pad name").max(120), fieldId: z.coerce.number().int().positive("Choose a field") });
