import { SavedMapping } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { toMappingView, type MappingView } from "./mapping-view";

/** Saved mappings of the actor's organization, by name. */
export async function listMappings(actor: Actor): Promise<MappingView[]> {
  requireCapability(actor, "uploads.read");
  const rows = await SavedMapping.findAll({ where: { organization_id: actor.organizationId }, order: [["name", "ASC"]] });
  return rows.map(toMappingView);
}
