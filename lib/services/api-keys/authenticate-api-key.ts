// The public API's identity: "Authorization: Bearer blw_…" → an Actor with the
// analyst role's rights in the key's organization (it may send and read uploads,
// never manage people or keys). Wrong, unknown and revoked keys all get the same
// 401 so a caller learns nothing about which keys exist.
import { Op } from "sequelize";
import { ApiKey } from "@/models";
import { AppError } from "@/lib/errors";
import type { Actor } from "@/lib/auth/actor";
import { API_KEY_PREFIX, hashApiKey } from "./api-key-hash";

/** last_used_at is written at most this often per key, not on every request. */
const LAST_USED_RESOLUTION_MS = 60_000;

const refused = () => new AppError("unauthenticated", "Send a valid API key as 'Authorization: Bearer blw_…'");

export async function authenticateApiKey(bearerHeader: string | null | undefined): Promise<Actor> {
  const m = /^Bearer\s+(\S+)\s*$/i.exec(bearerHeader ?? "");
  const key = m?.[1];
  if (!key || !key.startsWith(API_KEY_PREFIX) || key.length > 200) throw refused();
  const row = await ApiKey.findOne({ where: { key_hash: hashApiKey(key) } });
  if (!row || row.revoked_at) throw refused();
  const now = Date.now();
  if (!row.last_used_at || now - row.last_used_at.getTime() >= LAST_USED_RESOLUTION_MS) {
    // Conditional update: several concurrent requests write it once.
    await ApiKey.update(
      { last_used_at: new Date(now) },
      { where: { id: row.id, [Op.or]: [{ last_used_at: null }, { last_used_at: { [Op.lt]: new Date(now - LAST_USED_RESOLUTION_MS) } }] } },
    );
  }
  return { userId: null, organizationId: row.organization_id, role: "analyst", apiKeyId: row.id };
}
