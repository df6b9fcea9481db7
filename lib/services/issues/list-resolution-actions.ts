import { Organization } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { notFound } from "@/lib/errors";
import { DEFAULT_RESOLUTION_ACTIONS } from "@/lib/validations/issues";

/** What an operator may record as done, from organizations.settings.resolutionActions. */
export async function listResolutionActions(actor: Actor): Promise<string[]> {
  requireCapability(actor, "issues.read");
  const org = await Organization.findByPk(actor.organizationId, { attributes: ["settings"] });
  if (!org) throw notFound();
  const list = (org.settings as { resolutionActions?: unknown }).resolutionActions;
  return Array.isArray(list) && list.length > 0 && list.every((x) => typeof x === "string") ? (list as string[]) : [...DEFAULT_RESOLUTION_ACTIONS];
}
