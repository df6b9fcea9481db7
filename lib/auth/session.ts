// Server-side identity for pages, route handlers and actions. The session
// says who signed in; the database says whether they still may (active,
// current role and organization), so a role change takes effect at once.
import { getServerSession } from "next-auth";
import { redirect } from "next/navigation";
import { authOptions } from "./options";
import { findActiveActor } from "@/lib/services/auth/find-active-actor";
import type { Actor } from "./actor";
import { can, type Capability } from "./roles";

export async function getActor(): Promise<Actor | null> {
  const session = await getServerSession(authOptions);
  const uid = session?.user?.id;
  if (!uid) return null;
  return findActiveActor(uid);
}

/** For pages: send the signed-out to sign in, and the wrong role to a refusal page. */
export async function requirePageActor(capability?: Capability): Promise<Actor> {
  const actor = await getActor();
  if (!actor) redirect("/login");
  if (capability && !can(actor.role, capability)) redirect("/forbidden");
  return actor;
}
