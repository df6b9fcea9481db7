import { User } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import type { Role } from "@/lib/auth/roles";

export interface UserRow { id: number; email: string; name: string; role: Role; active: boolean; hasPassword: boolean }

export async function listUsers(actor: Actor): Promise<UserRow[]> {
  requireCapability(actor, "users.manage");
  const rows = await User.findAll({ where: { organization_id: actor.organizationId }, order: [["name", "ASC"]] });
  return rows.map((u) => ({ id: u.id, email: u.email, name: u.name, role: u.role, active: u.active, hasPassword: !!u.password_hash }));
}
