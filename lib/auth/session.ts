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
 * enough for that, and on every API request next-auth took 4–9% of the web
 * process's CPU under the dashboard bench (measured).
 */
const REISSUE_AFTER_MS = 3600_000;

/**
 * Decrypted session tokens, by the token's exact text: the same text always decrypts
 * to the same payload, and every request of a session sends it again (each decrypt
 * derives a key and opens a JWE). The expiry is still checked on every use, and the
 * database check (findActiveActor) still runs.
 */
const MAX_TOKENS = 1000;
const g = globalThis as unknown as { __bellowsSessionTokens?: Map<string, { uid: number; expMs: number }> };
const decoded = (g.__bellowsSessionTokens ??= new Map());

async function decodeSessionToken(token: string): Promise<{ uid: number; expMs: number } | null> {
  const known = decoded.get(token);
  if (known) return known;
  const payload = await decode({ token, secret: authOptions.secret! }).catch(() => null);
  if (typeof payload?.uid !== "number" || typeof payload.exp !== "number") return null;
  const entry = { uid: payload.uid, expMs: payload.exp * 1000 };
  if (decoded.size >= MAX_TOKENS) decoded.clear();
  decoded.set(token, entry);
  return entry;
}

/** The signed-in user's id from a recently issued session token; null when it must go the full way. */
async function readRecentSessionUserId(): Promise<number | null> {
  const jar = await cookies();
  const maxAgeMs = (authOptions.session?.maxAge ?? 0) * 1000;
  for (const name of SESSION_COOKIES) {
    const token = jar.get(name)?.value;
    if (!token) continue;
    const t = await decodeSessionToken(token);
    // exp = issued + maxAge: more than maxAge - 1 h left means issued within the hour
    // (and, a fortiori, not expired).
    if (t && t.expMs - Date.now() > maxAgeMs - REISSUE_AFTER_MS) return t.uid;
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
