import { QueryTypes } from "sequelize";
import { sequelize } from "@/models";
import type { Actor } from "@/lib/auth/actor";
import type { Role } from "@/lib/auth/roles";

/**
 * The database's word on a signed-in user: still active, and with which role and
 * organization now (so a role change or a switched-off account takes effect at once).
 * A plain SELECT rather than a model read: every request asks, and three columns
 * need no model instance.
 */
export async function findActiveActor(userId: number): Promise<Actor | null> {
  if (!Number.isSafeInteger(userId)) return null;
  const [user] = await sequelize.query<{ id: number; organization_id: number; role: Role }>(
    "SELECT id, organization_id, role FROM users WHERE id = $1 AND active",
    { type: QueryTypes.SELECT, bind: [userId] },
  );
  if (!user) return null;
  return { userId: user.id, organizationId: user.organization_id, role: user.role };
}
