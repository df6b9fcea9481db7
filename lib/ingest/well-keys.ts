// Matching a file's well key (a name or UWI as written in the file) to a well id,
// from plain look-up tables, so the same matching runs wherever the rows are parsed
// (the parse thread gets the tables, not the database). Matching ignores case and
// repeated spaces; the person's explicit matches win over the register.
export interface WellKeyTable {
  /** Normalised key → well id, from the register (UWIs, and names that are unique). */
  byKey: [string, number][];
  /** Normalised key → well id, chosen by the person for this upload. */
  explicit: [string, number][];
}

export function normaliseWellKey(key: string): string {
  return key.trim().replace(/\s+/g, " ").toLowerCase();
}

export function createWellKeyResolver(table: WellKeyTable): (key: string) => number | undefined {
  const byKey = new Map(table.byKey);
  const explicit = new Map(table.explicit);
  return (key) => {
    const k = normaliseWellKey(key);
    return explicit.get(k) ?? byKey.get(k);
  };
}
