import { SavedMapping } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { toMappingView, type MappingView } from "./mapping-view";

/** The saved mapping of that name in the actor's organization, or null. */
export async function findMappingByName(actor: Actor, name: string): Promise<MappingView | null> {
  requireCapability(actor, "uploads.read");
  const row = await SavedMapping.findOne({ where: { organization_id: actor.organizationId, name: name.trim() } });
  return row ? toMappingView(row) : null;
}
