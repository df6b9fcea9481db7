// generateField: an invented gas-lift field of pads and wells for the demo seed and
// the tests. Every main rule appears on some wells, confounders (normal kick-off,
// setpoint change, pad-wide supply outage) on others, and the rest run normally.
// Deterministic for a given seed.
import type { ScenarioKind, WellScenario } from "@/lib/scenario/scenario-types";
import { generateWellScenario } from "@/lib/scenario/well-scenario";
import { createRng, deriveSeed } from "@/lib/scenario/prng";
import { inventFieldName, inventWellName } from "@/lib/scenario/names";

export interface FieldOptions {
  seed: number;
  wells: number;
  days: number;
  /** Epoch ms of the first sample. */
  start: number;
  /** Wells per pad (default 4). */
  wellsPerPad?: number;
  /** Kinds to deal out in turn (default: every rule, then confounders, then normal wells). */
  kinds?: ScenarioKind[];
}

export interface FieldWell extends WellScenario {
  wellId: string;
  name: string;
  padId: string;
  padName: string;
}

export interface FieldPad {
  padId: string;
  name: string;
  wellIds: string[];
  /** Supply outages on this pad (epoch ms), also labelled on each of its wells. */
  outages: { start: number; end: number }[];
}

export interface GeneratedField {
  name: string;
  pads: FieldPad[];
  wells: FieldWell[];
}

/** Default deal: each main signature, each confounder, and normal wells. */
export const DEFAULT_KIND_CYCLE: ScenarioKind[] = [
  "multipointing", "heading", "valve_leak", "liquid_loading",
  "frac_hit", "over_injection", "fast_kickoff", "data_quality",
  "kickoff", "setpoint_change", "normal", "normal",
];

export function generateField(opts: FieldOptions): GeneratedField {
  const rng = createRng(deriveSeed(opts.seed, "field"));
  const name = inventFieldName(rng);
  const perPad = opts.wellsPerPad ?? 4;
  const cycle = opts.kinds ?? DEFAULT_KIND_CYCLE;
  // Shuffle the deal once per field so pads mix problems and quiet wells.
  const kinds = Array.from({ length: opts.wells }, (_, i) => cycle[i % cycle.length]);
  const padCount = Math.ceil(opts.wells / perPad);
  const outagePads = new Set<number>();
  // One pad in three has a supply outage; its wells get only confounder or normal kinds.
  for (let p = 0; p < padCount; p += 3) outagePads.add(p);
  const quietKinds = kinds.filter((k) => k === "normal" || k === "kickoff" || k === "setpoint_change");
  const busyKinds = kinds.filter((k) => !(k === "normal" || k === "kickoff" || k === "setpoint_change"));
  const pads: FieldPad[] = [];
  const wells: FieldWell[] = [];
  const usedSections = new Set<number>();
  for (let p = 0; p < padCount; p++) {
    let section = rng.int(1, 36);
    while (usedSections.has(section) && usedSections.size < 36) section = rng.int(1, 36);
    usedSections.add(section);
    const padId = `pad-${p + 1}`;
    const padName = `${name.split(" ")[0]} ${section}${String.fromCharCode(65 + (p % 26))} Pad`;
    const outages: FieldPad["outages"] = [];
    if (outagePads.has(p)) {
      const at = opts.start + Math.round(rng.uniform(0.18, 0.32) * opts.days * 1440) * 60_000;
      outages.push({ start: at, end: at + rng.int(120, 360) * 60_000 });
    }
    const pad: FieldPad = { padId, name: padName, wellIds: [], outages };
    const count = Math.min(perPad, opts.wells - p * perPad);
    for (let k = 0; k < count; k++) {
      const pool = outagePads.has(p) && quietKinds.length ? quietKinds : busyKinds.length ? busyKinds : quietKinds;
      const kind = pool.shift() as ScenarioKind;
      const wellNumber = k + 1;
      const wellId = `w-${p + 1}-${wellNumber}`;
      const scenario = generateWellScenario({
        seed: deriveSeed(opts.seed, wellId),
        kind,
        start: opts.start,
        days: opts.days,
        outages,
      });
      pad.wellIds.push(wellId);
      wells.push({ ...scenario, wellId, name: inventWellName(name, section, wellNumber), padId, padName });
    }
    pads.push(pad);
  }
  return { name, pads, wells };
}
