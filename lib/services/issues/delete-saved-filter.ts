import { SavedFilter } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { AppError, notFound } from "@/lib/errors";

/** Remove one of the person's own saved filters (someone else's id is 404). */
export async function deleteSavedFilter(actor: Actor, filterId: number): Promise<void> {
  requireCapability(actor, "issues.read");
  if (!actor.userId) throw new AppError("forbidden", "Only a person has saved filters");
  const n = await SavedFilter.destroy({ where: { id: filterId, user_id: actor.userId, organization_id: actor.organizationId } });
  if (n === 0) throw notFound("Saved filter not found");
}
