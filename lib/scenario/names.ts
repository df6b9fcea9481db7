// Invented names for synthetic fields, pads and wells. Plain landscape words put
// together at random; any likeness to a real lease or operator is accidental.
import type { Rng } from "@/lib/scenario/prng";

const FIRST = ["Cinder", "Juniper", "Saltbush", "Red Mesa", "Coyote", "Hollow", "Ironwood", "Dry Fork", "Sandhill", "Mesquite", "Larkspur", "Bitter Creek"];
const SECOND = ["Flats", "Draw", "Ridge", "Basin", "Bench", "Wash", "Butte", "Springs", "Hills", "Crossing"];

/** A field name like "Cinder Flats". */
export function inventFieldName(rng: Rng): string {
  return `${rng.pick(FIRST)} ${rng.pick(SECOND)}`;
}

/** Well name like "Cinder Flats 12-3". */
export function inventWellName(field: string, section: number, wellNumber: number): string {
  return `${field} ${section}-${wellNumber}`;
}
