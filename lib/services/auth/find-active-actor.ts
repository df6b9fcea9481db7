import { User } from "@/models";
import type { Actor } from "@/lib/auth/actor";

/**
 * The database's word on a signed-in user: still active, and with which role and
 * organization now (so a role change or a switched-off account takes effect at once).
 */
export async function findActiveActor(userId: number): Promise<Actor | null> {
  const user = await User.findByPk(userId, { attributes: ["id", "organization_id", "role", "active"] });
  if (!user || !user.active) return null;
  return { userId: user.id, organizationId: user.organization_id, role: user.role };
}
