// Server-side identity for pages, route handlers and actions. The session
// says who signed in; the database says whether they still may (active,
// current role and organization), so a role change takes effect at once.
import { getServerSession } from "next-auth";
import { decode } from "next-auth/jwt";
import { cookies } from "next/headers";
import { redirect } from "next/navigation";
import { authOptions } from "./options";
import { findActiveActor } from "@/lib/services/auth/find-active-actor";
import type { Actor } from "./actor";
import { can, type Capability } from "./roles";

/** next-auth's session cookie: with the secure prefix when the site is served over https. */
const SESSION_COOKIES = ["__Secure-next-auth.session-token", "next-auth.session-token"];
/**
 * A session token issued less than this long ago is only read. getServerSession
 * also re-issues the token with a new expiry on every call (a second encryption and
 * a Set-Cookie): that keeps a session alive while it is used, but once an hour is
 * enough for that, and on every API request it cost about as much CPU as the rest
 * of a small request (measured under the dashboard bench).
 */
const REISSUE_AFTER_MS = 3600_000;

/** The signed-in user's id from a recently issued session token; null when it must go the full way. */
async function readRecentSessionUserId(): Promise<number | null> {
  const jar = await cookies();
  const maxAgeMs = (authOptions.session?.maxAge ?? 0) * 1000;
  for (const name of SESSION_COOKIES) {
    const token = jar.get(name)?.value;
    if (!token) continue;
    const payload = await decode({ token, secret: authOptions.secret! }).catch(() => null);
    const uid = payload?.uid;
    const exp = typeof payload?.exp === "number" ? payload.exp * 1000 : 0;
    // exp = issued + maxAge: more than maxAge - 1 h left means issued within the hour.
    if (typeof uid === "number" && exp - Date.now() > maxAgeMs - REISSUE_AFTER_MS) return uid;
    return null;
  }
  return null;
}

export async function getActor(): Promise<Actor | null> {
  let uid = await readRecentSessionUserId();
  if (uid === null) {
    // No token, an invalid or expired one, or one due to be re-issued: next-auth's own way.
    const session = await getServerSession(authOptions);
    uid = session?.user?.id ?? null;
  }
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
