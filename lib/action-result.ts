// Server actions return this shape so forms can show field messages; the
// same AppError model as route handlers, mapped once here.
import { getActor } from "@/lib/auth/session";
import { AppError, isAppError, type FieldIssue } from "@/lib/errors";
import type { Actor } from "@/lib/auth/actor";

export type ActionResult<T = undefined> =
  | { ok: true; data: T }
  | { ok: false; message: string; issues: FieldIssue[] };

/** Run a service call for the signed-in actor and map errors for the form. */
export async function runAction<T>(fn: (actor: Actor) => Promise<T>): Promise<ActionResult<T>> {
  try {
    const actor = await getActor();
    if (!actor) throw new AppError("unauthenticated", "Your session has ended; sign in again");
    return { ok: true, data: await fn(actor) };
  } catch (e) {
    if (isAppError(e)) return { ok: false, message: e.message, issues: e.issues };
    console.error("[action]", e);
    return { ok: false, message: "Something went wrong on our side", issues: [] };
  }
}
