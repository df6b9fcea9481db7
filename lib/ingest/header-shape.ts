// A stable fingerprint of a header row, so a mapping saved for one export can be
// offered again for the next export of the same layout. Case, spacing, and "_"/"-"/"."
// differences are ignored; order and unit text are kept (a change of unit is a
// different layout).

/** Normalise one header name for comparison. */
export function normaliseHeaderName(name: string): string {
  return name.trim().toLowerCase().replace(/[\s_.\-]+/g, " ").trim();
}

/** FNV-1a 32-bit hash (public-domain algorithm by Fowler, Noll and Vo), hex. */
export function hashFnv1a(text: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h.toString(16).padStart(8, "0");
}

/** "<column count>:<hash of normalised names>". */
export function computeHeaderShape(columns: string[]): string {
  return `${columns.length}:${hashFnv1a(columns.map(normaliseHeaderName).join("\u0001"))}`;
}
