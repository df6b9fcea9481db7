import { User } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";

/** Active field operators of the organization, for the assign dialog. */
export async function listOrgOperators(actor: Actor): Promise<{ id: number; name: string; email: string }[]> {
  requireCapability(actor, "issues.triage");
  const rows = await User.findAll({
    where: { organization_id: actor.organizationId, role: "operator", active: true },
    attributes: ["id", "name", "email"],
    order: [["name", "ASC"]],
  });
  return rows.map((u) => ({ id: u.id, name: u.name, email: u.email }));
}
