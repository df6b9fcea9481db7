// Turn a long-layout tag into (well key, signal, unit) per the saved mapping.
import type { Signal } from "@/lib/signals";
import type { Unit } from "@/lib/units/units";
import type { LongMapping } from "./mapping";

export interface TagTarget {
  wellKey: string;
  signal: Signal;
  /** Undefined when the mapping names no unit for this signal. */
  unit?: Unit;
}

export type TagResolver = (tag: string) => TagTarget | null;

/** Build a resolver for the mapping's tag rules: a named-group pattern or an explicit table. */
export function createTagResolver(tags: LongMapping["tags"]): TagResolver {
  if (tags.mode === "table") {
    const table = new Map<string, TagTarget>();
    for (const e of tags.entries) table.set(e.tag.trim(), { wellKey: e.wellKey, signal: e.signal, unit: e.unit as Unit | undefined });
    return (tag) => table.get(tag.trim()) ?? null;
  }
  const re = new RegExp(tags.pattern);
  const aliases = new Map<string, Signal>();
  for (const [k, s] of Object.entries(tags.signalAliases)) aliases.set(k.trim().toLowerCase(), s);
  const units = tags.units as Partial<Record<Signal, Unit>>;
  return (tag) => {
    const m = re.exec(tag.trim());
    const well = m?.groups?.well?.trim();
    const text = m?.groups?.signal?.trim();
    if (!well || !text) return null;
    const signal = aliases.get(text.toLowerCase());
    return signal ? { wellKey: well, signal, unit: units[signal] } : null;
  };
}
