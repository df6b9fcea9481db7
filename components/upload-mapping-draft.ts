// The mapping form's working state, and its conversion to and from the saved
// Mapping shape (lib/ingest/mapping.ts). Kept pure so it can be unit-tested and
// shared by the mapping page (server) and its form (browser).
//
// The form keeps both layouts' answers at once, so switching layout back and
// forth never throws away what a person typed; only the chosen one is sent.
import { SIGNAL_QUANTITY, type Signal } from "@/lib/signals";
import { CANONICAL_UNIT, isUnitOf } from "@/lib/units/units";
import { createTagResolver, type TagTarget } from "@/lib/ingest/resolve-tag";
import type { Mapping } from "@/lib/ingest/mapping";
import type { Detection, Layout, TimeFormat } from "@/lib/ingest/types";

export interface WellOption {
  id: number;
  name: string;
  uwi: string;
  timeZone: string;
}

export interface AliasRow { text: string; signal: Signal | "" }
export interface TableRow { tag: string; wellKey: string; signal: Signal | ""; unit: string }

export interface MappingDraft {
  layout: Layout;
  timeColumn: string;
  timeFormat: TimeFormat;
  timeZone: string;
  delimiter?: Mapping["delimiter"];
  decimalComma?: boolean;
  wide: {
    wellMode: "column" | "one";
    wellColumn: string;
    /** The registered well the whole file belongs to (wellMode "one"). */
    wellId: number | null;
    /** Column → signal and unit; a column absent or with signal "" is ignored. */
    columns: Record<string, { signal: Signal | ""; unit: string }>;
  };
  long: {
    tagColumn: string;
    valueColumn: string;
    qualityColumn: string;
    /** Comma-separated quality texts meaning "good". */
    goodQuality: string;
    mode: "pattern" | "table";
    pattern: string;
    aliases: AliasRow[];
    units: Partial<Record<Signal, string>>;
    entries: TableRow[];
  };
}

/** A tag written as "<well>.<signal>", the most common shape; only a starting point. */
export const DEFAULT_TAG_PATTERN = "^(?<well>.+)\\.(?<signal>[^.]+)$";

export function canonicalUnitOf(signal: Signal): string {
  return CANONICAL_UNIT[SIGNAL_QUANTITY[signal]];
}

// Same rule as the server's well index: case and repeated spaces do not matter.
const norm = (s: string) => s.trim().replace(/\s+/g, " ").toLowerCase();

/** A registered well whose name or identifier equals the key (ignoring case and edge spaces). */
export function findWell(key: string, wells: WellOption[]): WellOption | undefined {
  const k = norm(key);
  return wells.find((w) => norm(w.name) === k || (w.uwi && norm(w.uwi) === k));
}

/** Build the form state from a mapping (saved or suggested) and the detection. */
export function draftFromMapping(m: Mapping, d: Detection, wells: WellOption[]): MappingDraft {
  const wideCols: MappingDraft["wide"]["columns"] = {};
  for (const c of m.wide?.columns ?? []) wideCols[c.column] = { signal: c.signal, unit: c.unit ?? "" };
  const oneWell = m.wide?.wellKey ? findWell(m.wide.wellKey, wells) : undefined;
  const tags = m.long?.tags;
  return {
    layout: m.layout,
    timeColumn: m.timeColumn,
    timeFormat: m.timeFormat,
    timeZone: m.timeZone,
    delimiter: m.delimiter,
    decimalComma: m.decimalComma,
    wide: {
      wellMode: m.wide?.wellColumn ? "column" : d.wellColumn && !m.wide ? "column" : "one",
      wellColumn: m.wide?.wellColumn ?? d.wellColumn ?? "",
      wellId: oneWell?.id ?? null,
      columns: wideCols,
    },
    long: {
      tagColumn: m.long?.tagColumn ?? d.tagColumn ?? "",
      valueColumn: m.long?.valueColumn ?? d.valueColumn ?? "",
      qualityColumn: m.long?.qualityColumn ?? d.qualityColumn ?? "",
      goodQuality: (m.long?.goodQualityValues ?? []).join(", "),
      mode: tags?.mode ?? "pattern",
      pattern: tags?.mode === "pattern" ? tags.pattern : DEFAULT_TAG_PATTERN,
      aliases: tags?.mode === "pattern" ? Object.entries(tags.signalAliases).map(([text, signal]) => ({ text, signal })) : [],
      units: tags?.mode === "pattern" ? { ...(tags.units as Partial<Record<Signal, string>>) } : {},
      entries:
        tags?.mode === "table"
          ? tags.entries.map((e) => ({ tag: e.tag, wellKey: e.wellKey, signal: e.signal, unit: e.unit ?? "" }))
          : [],
    },
  };
}

/** The signals the pattern's aliases point at, each once, in first-seen order. */
export function listAliasSignals(aliases: AliasRow[]): Signal[] {
  return [...new Set(aliases.map((a) => a.signal).filter((s): s is Signal => s !== ""))];
}

/** Assemble the Mapping to send. Not validated here: callers run MappingSchema on it. */
export function mappingFromDraft(draft: MappingDraft, wells: WellOption[]): Mapping {
  const base = {
    layout: draft.layout,
    timeColumn: draft.timeColumn,
    timeFormat: draft.timeFormat,
    timeZone: draft.timeZone,
    ...(draft.delimiter ? { delimiter: draft.delimiter } : {}),
    ...(draft.decimalComma !== undefined ? { decimalComma: draft.decimalComma } : {}),
  };
  if (draft.layout === "wide") {
    const w = draft.wide;
    const one = w.wellId === null ? undefined : wells.find((x) => x.id === w.wellId);
    const columns = Object.entries(w.columns)
      .filter(([column, c]) => c.signal !== "" && column !== draft.timeColumn && !(w.wellMode === "column" && column === w.wellColumn))
      .map(([column, c]) => ({ column, signal: c.signal as Signal, ...(c.unit ? { unit: c.unit } : {}) }));
    return {
      ...base,
      wide: {
        ...(w.wellMode === "column" ? { wellColumn: w.wellColumn || undefined } : { wellKey: one?.name }),
        columns,
      },
    } as Mapping;
  }
  const l = draft.long;
  const goodQualityValues = l.goodQuality.split(",").map((s) => s.trim()).filter(Boolean);
  const signals = listAliasSignals(l.aliases);
  const units: Partial<Record<Signal, string>> = {};
  for (const s of signals) if (l.units[s]) units[s] = l.units[s];
  const tags =
    l.mode === "pattern"
      ? {
          mode: "pattern" as const,
          pattern: l.pattern,
          signalAliases: Object.fromEntries(l.aliases.filter((a) => a.text.trim() && a.signal).map((a) => [a.text.trim().toLowerCase(), a.signal])),
          units,
        }
      : {
          mode: "table" as const,
          entries: l.entries
            .filter((e) => e.tag.trim() && e.wellKey.trim() && e.signal)
            .map((e) => ({ tag: e.tag.trim(), wellKey: e.wellKey.trim(), signal: e.signal as Signal, ...(e.unit ? { unit: e.unit } : {}) })),
        };
  return {
    ...base,
    long: {
      tagColumn: l.tagColumn,
      valueColumn: l.valueColumn,
      ...(l.qualityColumn ? { qualityColumn: l.qualityColumn } : {}),
      ...(l.qualityColumn && goodQualityValues.length > 0 ? { goodQualityValues } : {}),
      tags,
    },
  } as Mapping;
}

/** Tags seen in the head of the file (the detection's list, or the preview's tag column). */
export function listSeenTags(d: Detection, tagColumn: string): string[] {
  if (d.tagValues && d.tagValues.length > 0 && tagColumn === d.tagColumn) return d.tagValues;
  const i = d.columns.indexOf(tagColumn);
  if (i < 0) return [];
  return [...new Set(d.preview.map((r) => (r[i] ?? "").trim()).filter(Boolean))];
}

/** How each seen tag resolves under the current rule; a broken pattern resolves nothing. */
export function resolveSeenTags(m: Mapping, d: Detection): { tag: string; target: TagTarget | null }[] {
  if (m.layout !== "long" || !m.long) return [];
  let resolve: (t: string) => TagTarget | null = () => null;
  try {
    resolve = createTagResolver(m.long.tags);
  } catch {
    // An invalid regular expression is reported by the schema check.
  }
  return listSeenTags(d, m.long.tagColumn).map((tag) => ({ tag, target: resolve(tag) }));
}

/** Well keys the file will produce under the mapping (from the head of the file). */
export function listWellKeys(m: Mapping, d: Detection): string[] {
  if (m.layout === "long") {
    return [...new Set(resolveSeenTags(m, d).flatMap((r) => (r.target ? [r.target.wellKey] : [])))];
  }
  if (m.wide?.wellColumn) {
    const i = d.columns.indexOf(m.wide.wellColumn);
    if (i < 0) return [];
    return [...new Set(d.preview.map((r) => (r[i] ?? "").trim()).filter(Boolean))];
  }
  return m.wide?.wellKey ? [m.wide.wellKey] : [];
}

/** Keys the register does not know by name or identifier, plus any the server flagged. */
export function listUnknownWellKeys(keys: string[], wells: WellOption[], flagged: string[] = []): string[] {
  const out = new Set<string>();
  for (const k of [...keys, ...flagged]) if (!findWell(k, wells)) out.add(k);
  return [...out];
}

/** A unit kept when it still fits the (new) signal, else the signal's canonical unit. */
export function keepOrDefaultUnit(signal: Signal, unit: string): string {
  return unit && isUnitOf(SIGNAL_QUANTITY[signal], unit) ? unit : canonicalUnitOf(signal);
}

/** The zone to propose for naive timestamps: the field time zone of a well in the file, else the org's first field's. */
export function proposeTimeZone(keys: string[], wells: (WellOption & { fieldTimeZone?: string })[], fallback: string): string {
  for (const k of keys) {
    const w = findWell(k, wells) as (WellOption & { fieldTimeZone?: string }) | undefined;
    if (w) return w.fieldTimeZone ?? w.timeZone;
  }
  return fallback;
}
