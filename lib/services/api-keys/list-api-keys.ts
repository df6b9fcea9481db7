import { ApiKey } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { toApiKeyView, type ApiKeyView } from "./api-key-view";

/** The organization's keys, newest first, without any secret. */
export async function listApiKeys(actor: Actor): Promise<ApiKeyView[]> {
  requireCapability(actor, "apikeys.manage");
  const rows = await ApiKey.findAll({ where: { organization_id: actor.organizationId }, order: [["created_at", "DESC"], ["id", "DESC"]] });
  return rows.map(toApiKeyView);
}
