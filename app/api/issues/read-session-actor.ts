// The signed-in actor for the issue routes, or a 401.
import { getActor } from "@/lib/auth/session";
import type { Actor } from "@/lib/auth/actor";
import { AppError } from "@/lib/errors";

export async function readSessionActor(): Promise<Actor> {
  const actor = await getActor();
  if (!actor) throw new AppError("unauthenticated", "Please sign in");
  return actor;
}
