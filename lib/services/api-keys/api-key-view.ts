import type { ApiKey } from "@/models";

export interface ApiKeyView {
  id: number;
  name: string;
  /** The first characters of the key, e.g. "blw_Xy3k". */
  prefix: string;
  createdAt: string;
  lastUsedAt: string | null;
  revokedAt: string | null;
}

export function toApiKeyView(k: ApiKey): ApiKeyView {
  return {
    id: k.id,
    name: k.name,
    prefix: k.prefix,
    createdAt: k.created_at.toISOString(),
    lastUsedAt: k.last_used_at?.toISOString() ?? null,
    revokedAt: k.revoked_at?.toISOString() ?? null,
  };
}
