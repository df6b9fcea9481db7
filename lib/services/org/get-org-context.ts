import { Organization, User } from "@/models";
import type { Actor } from "@/lib/auth/actor";
import { notFound } from "@/lib/errors";
import type { UnitSystem } from "@/lib/units/units";

export interface OrgContext {
  organizationName: string;
  userName: string;
  email: string;
  unitSystem: UnitSystem;
}

/** What the shell shows about the signed-in person and their organization. */
export async function getOrgContext(actor: Actor): Promise<OrgContext> {
  const [org, user] = await Promise.all([
    Organization.findByPk(actor.organizationId, { attributes: ["name"] }),
    actor.userId ? User.findOne({ where: { id: actor.userId, organization_id: actor.organizationId } }) : null,
  ]);
  if (!org) throw notFound();
  return {
    organizationName: org.name,
    userName: user?.name ?? "API key",
    email: user?.email ?? "",
    unitSystem: user?.unit_system ?? "oilfield",
  };
}
