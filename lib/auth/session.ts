// Server-side identity for pages, route handlers and actions. The session
// says who signed in; the database says whether they still may (active,
// current role and organization), so a role change takes effect at once.
import { getServerSession } from "next-auth";
import { redirect } from "next/navigation";
import { authOptions } from "./options";
import { User } from "@/models";
import type { Actor } from "./actor";
import { can, type Capability } from "./roles";

export async function getActor(): Promise<Actor | null> {
  const session = await getServerSession(authOptions);
  const uid = session?.user?.id;
  if (!uid) return null;
  const user = await User.findByPk(uid, { attributes: ["id", "organization_id", "role", "active"] });
  if (!user || !user.active) return null;
  return { userId: user.id, organizationId: user.organization_id, role: user.role };
}

/** For pages: send the signed-out to sign in, and the wrong role to a refusal page. */
export async function requirePageActor(capability?: Capability): Promise<Actor> {
  const actor = await getActor();
  if (!actor) redirect("/login");
  if (capability && !can(actor.role, capability)) redirect("/forbidden");
  return actor;
}
