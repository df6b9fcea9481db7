// Propose a mapping from a Detection: which columns or tags are which signal, in
// which unit. The person confirms or edits it; nothing here is final.
//
//   suggestMapping(detection, { timeZone?, wellKey? }) → { mapping, isComplete, notes }
//
// `isComplete` is true when the proposal already passes MappingSchema (a wide file
// without a well column needs `wellKey` before it does).
import { SIGNAL_QUANTITY, type Signal } from "@/lib/signals";
import { CANONICAL_UNIT, type Unit } from "@/lib/units/units";
import { guessSignal, guessUnit } from "./guess-signal";
import { MappingSchema, type Mapping, type WideMapping } from "./mapping";
import type { Detection } from "./types";

export interface MappingSuggestion {
  mapping: Mapping;
  isComplete: boolean;
  notes: string[];
}

const TAG_SEPARATORS = [".", ":", "/", "\\", "|", "_", "-", " "];

function escapeRe(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\/-]/g, "\\$&");
}

interface TagSplit {
  pattern: string;
  split: (tag: string) => { well: string; signalText: string } | null;
}

/** Candidate ways to cut "<well><sep><signal>" (or the reverse), the signal part holding k−1 separators. */
function listTagSplits(): TagSplit[] {
  const out: TagSplit[] = [];
  for (const sep of TAG_SEPARATORS) {
    const e = escapeRe(sep);
    const part = `[^${e}]+`;
    for (let k = 1; k <= 3; k++) {
      const sig = k === 1 ? part : `${part}(?:${e}${part}){${k - 1}}`;
      const wellFirst = new RegExp(`^(?<well>.+)${e}(?<signal>${sig})$`);
      const signalFirst = new RegExp(`^(?<signal>${sig})${e}(?<well>.+)$`);
      for (const re of [wellFirst, signalFirst]) {
        out.push({
          pattern: re.source,
          split: (tag) => {
            const m = re.exec(tag);
            return m?.groups ? { well: m.groups.well, signalText: m.groups.signal } : null;
          },
        });
      }
    }
  }
  return out;
}

/** A signal part of a tag: recognised, and no bare number in it (that belongs to the well name). */
function readSignalText(text: string): Signal | undefined {
  if (/(^|[^A-Za-z0-9])\d+([^A-Za-z0-9]|$)/.test(text)) return undefined;
  return guessSignal(text);
}

function defaultUnit(signal: Signal): Unit {
  return CANONICAL_UNIT[SIGNAL_QUANTITY[signal]];
}

/** "Good" (text) and 192 (the OPC DA good-quality code, common practice) mark good values. */
function suggestGoodQuality(d: Detection, notes: string[]): string[] | undefined {
  const i = d.qualityColumn === undefined ? -1 : d.columns.indexOf(d.qualityColumn);
  if (i < 0) return undefined;
  const seen = new Set(d.preview.map((r) => (r[i] ?? "").trim().toLowerCase()));
  const good = ["good", "192", "ok"].filter((g) => seen.has(g));
  if (good.length === 0) return undefined;
  notes.push(`Values whose ${d.qualityColumn} is not ${good.join(" / ")} will be refused as status text.`);
  return good;
}

function suggestLong(d: Detection, notes: string[]): NonNullable<Mapping["long"]> {
  const tagIdx = d.columns.indexOf(d.tagColumn ?? "");
  const tags = d.tagValues ?? [...new Set(d.preview.map((r) => (r[tagIdx] ?? "").trim()).filter(Boolean))];
  const base = { tagColumn: d.tagColumn ?? "", valueColumn: d.valueColumn ?? "", qualityColumn: d.qualityColumn, goodQualityValues: suggestGoodQuality(d, notes) };
  const signalsOf = (aliases: Record<string, Signal>) => [...new Set(Object.values(aliases))];
  const unitsFor = (signals: Signal[]) => {
    const units: Partial<Record<Signal, Unit>> = {};
    for (const s of signals) units[s] = defaultUnit(s);
    if (signals.length > 0) notes.push(`Tag units assumed canonical (${signals.map((s) => `${s}: ${units[s]}`).join(", ")}); change them if the historian stores other units.`);
    return units;
  };
  for (const split of listTagSplits()) {
    const aliases: Record<string, Signal> = {};
    const isEveryTagSplit = tags.length > 0 && tags.every((t) => {
      const parts = split.split(t);
      const signal = parts ? readSignalText(parts.signalText) : undefined;
      if (!parts || !signal || !parts.well.trim()) return false;
      aliases[parts.signalText.toLowerCase()] = signal;
      return true;
    });
    if (isEveryTagSplit) {
      return { ...base, tags: { mode: "pattern", pattern: split.pattern, signalAliases: aliases, units: unitsFor(signalsOf(aliases)) } };
    }
  }
  // No one rule fits every tag: list the tags we can read, one by one.
  const entries: { tag: string; wellKey: string; signal: Signal; unit?: Unit }[] = [];
  for (const tag of tags) {
    const hit = listTagSplits().map((s) => s.split(tag)).find((p) => p && p.well.trim() && readSignalText(p.signalText));
    if (!hit) {
      notes.push(`Tag "${tag}": no signal recognised; map it by hand.`);
      continue;
    }
    const signal = readSignalText(hit.signalText) as Signal;
    entries.push({ tag, wellKey: hit.well, signal, unit: defaultUnit(signal) });
  }
  return { ...base, tags: { mode: "table", entries } };
}

function suggestWide(d: Detection, notes: string[], wellKey: string | undefined): WideMapping {
  const columns: WideMapping["columns"] = [];
  const used = new Set<Signal>();
  for (const column of d.columns) {
    if (column === d.timeColumn || column === d.wellColumn) continue;
    const signal = guessSignal(column);
    if (!signal) {
      notes.push(`Column "${column}": no signal recognised; it will be ignored unless mapped.`);
      continue;
    }
    if (used.has(signal)) {
      notes.push(`Column "${column}" also reads as ${signal}; only the first such column is mapped.`);
      continue;
    }
    used.add(signal);
    const { unit, unitText } = guessUnit(column, signal);
    if (unitText !== undefined && unit === undefined) {
      notes.push(`Column "${column}": unit "${unitText}" is not a known ${SIGNAL_QUANTITY[signal].replace("_", " ")} unit; its values will be refused (unknown_unit) until a unit is chosen.`);
      columns.push({ column, signal });
    } else if (unit === undefined) {
      notes.push(`Column "${column}": no unit in the header; assumed ${defaultUnit(signal)}.`);
      columns.push({ column, signal, unit: defaultUnit(signal) });
    } else {
      columns.push({ column, signal, unit });
    }
  }
  if (!d.wellColumn && !wellKey) notes.push("No well column: choose the well this file belongs to.");
  return { wellColumn: d.wellColumn, wellKey: d.wellColumn ? undefined : wellKey, columns };
}

export function suggestMapping(detection: Detection, options: { timeZone?: string; wellKey?: string } = {}): MappingSuggestion {
  const notes: string[] = [];
  const timeZone = options.timeZone ?? "UTC";
  if (!options.timeZone && !detection.hasTimeOffset) notes.push("Time zone assumed UTC; set the zone the historian wrote local times in.");
  const mapping: Mapping = {
    layout: detection.layout,
    timeColumn: detection.timeColumn,
    timeFormat: detection.timeFormat,
    timeZone,
    delimiter: detection.delimiter,
    decimalComma: detection.decimalComma,
    ...(detection.layout === "long"
      ? { long: suggestLong(detection, notes) }
      : { wide: suggestWide(detection, notes, options.wellKey) }),
  };
  return { mapping, isComplete: MappingSchema.safeParse(mapping).success, notes };
}
