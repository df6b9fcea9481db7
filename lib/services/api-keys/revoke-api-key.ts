import { ApiKey } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { notFound } from "@/lib/errors";
import { writeAudit } from "@/lib/services/audit/write-audit";
import { toApiKeyView, type ApiKeyView } from "./api-key-view";

/** Revoke at once; revoking twice keeps the first revocation time. */
export async function revokeApiKey(actor: Actor, id: number): Promise<ApiKeyView> {
  requireCapability(actor, "apikeys.manage");
  const row = await ApiKey.findOne({ where: { id, organization_id: actor.organizationId } });
  if (!row) throw notFound("No such API key");
  if (!row.revoked_at) {
    await row.update({ revoked_at: new Date() });
    await writeAudit(actor, { action: "apikey.revoke", entityType: "api_key", entityId: String(row.id), after: { name: row.name, prefix: row.prefix } });
  }
  return toApiKeyView(row);
}
