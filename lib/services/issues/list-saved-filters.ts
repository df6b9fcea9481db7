import { SavedFilter } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { AppError } from "@/lib/errors";

export interface SavedFilterView { id: number; name: string; query: string }

/** The person's own saved list filters. */
export async function listSavedFilters(actor: Actor): Promise<SavedFilterView[]> {
  requireCapability(actor, "issues.read");
  if (!actor.userId) throw new AppError("forbidden", "Only a person has saved filters");
  const rows = await SavedFilter.findAll({ where: { user_id: actor.userId, organization_id: actor.organizationId }, order: [["name", "ASC"]] });
  return rows.map((r) => ({ id: r.id, name: r.name, query: r.query }));
}
