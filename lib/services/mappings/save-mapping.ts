// Save a mapping under a name, replacing the organization's mapping of that name.
// The header shape ties it to a file layout so the next file with the same header
// reuses it automatically.
import type { Transaction } from "sequelize";
import { SavedMapping } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { parseOrThrow } from "@/lib/http";
import { computeHeaderShape } from "@/lib/ingest/header-shape";
import type { Mapping } from "@/lib/ingest/mapping";
import { SaveMappingSchema, type SaveMappingInput } from "@/lib/validations/mappings";
import { toMappingView, type MappingView } from "./mapping-view";

/** Columns the mapping names; the header shape when the file's own header is not known. */
function listMappedColumns(m: Mapping): string[] {
  const cols = [m.timeColumn];
  if (m.long) cols.push(m.long.tagColumn, m.long.valueColumn, ...(m.long.qualityColumn ? [m.long.qualityColumn] : []));
  if (m.wide) cols.push(...(m.wide.wellColumn ? [m.wide.wellColumn] : []), ...m.wide.columns.map((c) => c.column));
  return cols;
}

export async function saveMapping(actor: Actor, input: SaveMappingInput, options: { transaction?: Transaction } = {}): Promise<MappingView> {
  requireCapability(actor, "mappings.manage");
  const { name, mapping, headerShape } = parseOrThrow(SaveMappingSchema, input);
  const shape = headerShape ?? computeHeaderShape(listMappedColumns(mapping));
  const transaction = options.transaction;
  const existing = await SavedMapping.findOne({ where: { organization_id: actor.organizationId, name }, transaction });
  if (existing) {
    await existing.update({ definition: mapping, layout: mapping.layout, header_shape: shape }, { transaction });
    return toMappingView(existing);
  }
  const row = await SavedMapping.create(
    { organization_id: actor.organizationId, name, definition: mapping, layout: mapping.layout, header_shape: shape },
    { transaction },
  );
  return toMappingView(row);
}
