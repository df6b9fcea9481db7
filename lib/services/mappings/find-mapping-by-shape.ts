import { SavedMapping } from "@/models";
import type { Actor } from "@/lib/auth/actor";
import { toMappingView, type MappingView } from "./mapping-view";

/** The most recently saved mapping made for files with this header shape, or null. */
export async function findMappingByShape(actor: Actor, headerShape: string): Promise<MappingView | null> {
  const row = await SavedMapping.findOne({
    where: { organization_id: actor.organizationId, header_shape: headerShape },
    order: [["updated_at", "DESC"]],
  });
  return row ? toMappingView(row) : null;
}
