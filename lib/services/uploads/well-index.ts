// Look-up of the file's well keys (a well name or UWI as written in the file) to
// registered wells of one organization. Matching ignores case and repeated spaces;
// the person's explicit matches from submitUpload win over the register.
import { Well } from "@/models";
import { createWellKeyResolver, normaliseWellKey, type WellKeyTable } from "@/lib/ingest/well-keys";

export interface WellIndex {
  resolve(key: string): number | undefined;
  /** The look-up tables, for a parser running elsewhere (the parse thread). */
  table: WellKeyTable;
}

export async function loadWellIndex(organizationId: number, matches: Record<string, number> = {}): Promise<WellIndex> {
  const wells = await Well.findAll({ where: { organization_id: organizationId }, attributes: ["id", "name", "uwi"], raw: true });
  const byKey = new Map<string, number>();
  // UWIs are unique per organization, names are not: a UWI wins, and a name shared by
  // two wells matches neither (the person must choose).
  const nameCount = new Map<string, number>();
  for (const w of wells) nameCount.set(normaliseWellKey(w.name), (nameCount.get(normaliseWellKey(w.name)) ?? 0) + 1);
  for (const w of wells) {
    const n = normaliseWellKey(w.name);
    if (nameCount.get(n) === 1 && !byKey.has(n)) byKey.set(n, w.id);
  }
  for (const w of wells) byKey.set(normaliseWellKey(w.uwi), w.id);
  const table: WellKeyTable = {
    byKey: [...byKey],
    explicit: Object.entries(matches).map(([k, id]) => [normaliseWellKey(k), id]),
  };
  return { resolve: createWellKeyResolver(table), table };
}
