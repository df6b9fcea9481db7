import { notFound } from "next/navigation";
import { isAppError } from "@/lib/errors";
import { getWell } from "@/lib/services/wells/get-well";
import type { WellDetail } from "@/lib/services/wells/well-dto";
import type { Actor } from "@/lib/auth/actor";

/** Load a well, turning the service's not-found (bad id or another organization) into the 404 page. */
export async function loadWellOr404(actor: Actor, rawId: string): Promise<WellDetail> {
  try {
    return await getWell(actor, Number(rawId));
  } catch (e) {
    if (isAppError(e) && e.code === "not_found") notFound();
    throw e;
  }
}
