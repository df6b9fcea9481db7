import { ApiKey } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { parseOrThrow } from "@/lib/http";
import { CreateApiKeySchema, type CreateApiKeyInput } from "@/lib/validations/api-keys";
import { writeAudit } from "@/lib/services/audit/write-audit";
import { generateApiKey, hashApiKey, SHOWN_PREFIX_LENGTH } from "./api-key-hash";

export interface CreatedApiKey {
  id: number;
  /** The whole key: shown once, never stored. */
  key: string;
  prefix: string;
}

export async function createApiKey(actor: Actor, input: CreateApiKeyInput): Promise<CreatedApiKey> {
  requireCapability(actor, "apikeys.manage");
  const { name } = parseOrThrow(CreateApiKeySchema, input);
  const key = generateApiKey();
  const prefix = key.slice(0, SHOWN_PREFIX_LENGTH);
  const row = await ApiKey.create({
    organization_id: actor.organizationId,
    name,
    prefix,
    key_hash: hashApiKey(key),
    created_by: actor.userId,
    last_used_at: null,
    revoked_at: null,
  });
  await writeAudit(actor, { action: "apikey.create", entityType: "api_key", entityId: String(row.id), after: { name, prefix } });
  return { id: row.id, key, prefix };
}
