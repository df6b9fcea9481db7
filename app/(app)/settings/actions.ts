"use server";

import { revalidatePath } from "next/cache";
import { runAction } from "@/lib/action-result";
import { updateOwnPreferences } from "@/lib/services/users/update-user";

export async function setUnitsAction(unitSystem: string) {
  const r = await runAction((actor) => updateOwnPreferences(actor, { unitSystem }));
  if (r.ok) revalidatePath("/", "layout");
  return r;
}
