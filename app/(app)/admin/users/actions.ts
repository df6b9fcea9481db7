"use server";

import { revalidatePath } from "next/cache";
import { runAction, type ActionResult } from "@/lib/action-result";
import { inviteUser } from "@/lib/services/users/invite-user";
import { updateUser } from "@/lib/services/users/update-user";

export async function inviteAction(_prev: ActionResult<{ id: number }> | null, form: FormData) {
  const r = await runAction((actor) => inviteUser(actor, { email: form.get("email"), name: form.get("name"), role: form.get("role") }));
  if (r.ok) revalidatePath("/admin/users");
  return r;
}

export async function updateUserAction(userId: number, patch: { role?: string; active?: boolean }) {
  const r = await runAction((actor) => updateUser(actor, userId, patch));
  if (r.ok) revalidatePath("/admin/users");
  return r;
}
