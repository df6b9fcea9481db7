// A saved mapping: how the columns or tags of one historian layout become
// (well, signal, unit). Validated with zod at every boundary (STYLE.md); units are
// checked against the quantity of the signal they are attached to.
//
// A unit may be left out: values of that column or tag are then refused with reason
// "unknown_unit" instead of guessing, so an unknown header unit never silently
// becomes psig.
import { z } from "zod";
import { SIGNALS, SIGNAL_QUANTITY, type Signal } from "@/lib/signals";
import { isUnitOf, UNITS } from "@/lib/units/units";
import { isValidTimeZone } from "./parse-time";
import { TIME_FORMATS } from "./types";

const signalSchema = z.enum(SIGNALS);
const ALL_UNITS = [...new Set(Object.values(UNITS).flat())] as [string, ...string[]];
const unitSchema = z.enum(ALL_UNITS, { error: `unknown unit; expected one of ${ALL_UNITS.join(", ")}` });

const patternTagsSchema = z.object({
  mode: z.literal("pattern"),
  /** A regular expression with named groups `well` and `signal`, matched against the whole tag. */
  pattern: z.string().min(1),
  /** Captured signal text (compared case-insensitively) → signal. */
  signalAliases: z.record(z.string(), signalSchema),
  units: z.partialRecord(signalSchema, unitSchema),
});

const tableTagsSchema = z.object({
  mode: z.literal("table"),
  entries: z
    .array(z.object({ tag: z.string().min(1), wellKey: z.string().min(1), signal: signalSchema, unit: unitSchema.optional() }))
    .min(1),
});

const longSchema = z.object({
  tagColumn: z.string().min(1),
  valueColumn: z.string().min(1),
  qualityColumn: z.string().min(1).optional(),
  /** Quality texts that mean "good"; other values of the quality column are refused as status text. */
  goodQualityValues: z.array(z.string()).optional(),
  tags: z.discriminatedUnion("mode", [patternTagsSchema, tableTagsSchema]),
});

const wideSchema = z.object({
  /** Column naming the well on each row… */
  wellColumn: z.string().min(1).optional(),
  /** …or the one well the whole file belongs to. */
  wellKey: z.string().min(1).optional(),
  columns: z.array(z.object({ column: z.string().min(1), signal: signalSchema, unit: unitSchema.optional() })).min(1),
});

export const MappingSchema = z
  .object({
    layout: z.enum(["long", "wide"]),
    timeColumn: z.string().min(1),
    timeFormat: z.enum(TIME_FORMATS),
    /** IANA zone for timestamps written without an offset. */
    timeZone: z.string().refine(isValidTimeZone, { message: "unknown IANA time zone" }),
    delimiter: z.enum([",", ";", "\t", "|"]).optional(),
    decimalComma: z.boolean().optional(),
    long: longSchema.optional(),
    wide: wideSchema.optional(),
  })
  .superRefine((m, ctx) => {
    if (m.layout === "long" && !m.long) ctx.addIssue({ code: "custom", path: ["long"], message: "a long layout needs the long section" });
    if (m.layout === "wide" && !m.wide) ctx.addIssue({ code: "custom", path: ["wide"], message: "a wide layout needs the wide section" });
    if (m.wide && !m.wide.wellColumn && !m.wide.wellKey) {
      ctx.addIssue({ code: "custom", path: ["wide", "wellKey"], message: "choose a well column or the well this file belongs to" });
    }
    const checkUnit = (signal: Signal, unit: string | undefined, path: (string | number)[]) => {
      if (unit !== undefined && !isUnitOf(SIGNAL_QUANTITY[signal], unit)) {
        ctx.addIssue({ code: "custom", path, message: `"${unit}" is not a ${SIGNAL_QUANTITY[signal].replace("_", " ")} unit (${signal})` });
      }
    };
    m.wide?.columns.forEach((c, i) => checkUnit(c.signal, c.unit, ["wide", "columns", i, "unit"]));
    const tags = m.long?.tags;
    if (tags?.mode === "table") tags.entries.forEach((e, i) => checkUnit(e.signal, e.unit, ["long", "tags", "entries", i, "unit"]));
    if (tags?.mode === "pattern") {
      for (const [s, u] of Object.entries(tags.units)) checkUnit(s as Signal, u, ["long", "tags", "units", s]);
      let re: RegExp | null = null;
      try {
        re = new RegExp(tags.pattern);
      } catch (e) {
        ctx.addIssue({ code: "custom", path: ["long", "tags", "pattern"], message: `invalid regular expression: ${(e as Error).message}` });
      }
      if (re && !/\(\?<well>/.test(tags.pattern)) ctx.addIssue({ code: "custom", path: ["long", "tags", "pattern"], message: "the pattern needs a named group (?<well>…)" });
      if (re && !/\(\?<signal>/.test(tags.pattern)) ctx.addIssue({ code: "custom", path: ["long", "tags", "pattern"], message: "the pattern needs a named group (?<signal>…)" });
    }
  });

export type Mapping = z.infer<typeof MappingSchema>;
export type LongMapping = NonNullable<Mapping["long"]>;
export type WideMapping = NonNullable<Mapping["wide"]>;
