"use server";
// The list page's writes: saved filters and the organization's resolution actions.
import { revalidatePath } from "next/cache";
import { runAction } from "@/lib/action-result";
import { saveFilter } from "@/lib/services/issues/save-filter";
import { deleteSavedFilter } from "@/lib/services/issues/delete-saved-filter";
import { saveResolutionActions } from "@/lib/services/issues/save-resolution-actions";

export async function saveFilterAction(name: string, query: string) {
  const r = await runAction((actor) => saveFilter(actor, { name, query }));
  if (r.ok) revalidatePath("/issues");
  return r;
}

export async function deleteFilterAction(filterId: number) {
  const r = await runAction((actor) => deleteSavedFilter(actor, filterId));
  if (r.ok) revalidatePath("/issues");
  return r;
}

export async function saveResolutionActionsAction(list: string[]) {
  const r = await runAction((actor) => saveResolutionActions(actor, list));
  if (r.ok) revalidatePath("/issues", "layout");
  return r;
}
