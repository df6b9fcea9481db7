"use server";
// Thin actions for organization API keys: the service checks the admin role,
// validates the name and writes the audit entry.
import { revalidatePath } from "next/cache";
import { runAction, type ActionResult } from "@/lib/action-result";
import { notFound } from "@/lib/errors";
import { createApiKey, type CreatedApiKey } from "@/lib/services/api-keys/create-api-key";
import { revokeApiKey } from "@/lib/services/api-keys/revoke-api-key";

export async function createApiKeyAction(name: string): Promise<ActionResult<CreatedApiKey>> {
  const result = await runAction((actor) => createApiKey(actor, { name: String(name ?? "") }));
  if (result.ok) revalidatePath("/admin/api-keys");
  return result;
}

export async function revokeApiKeyAction(id: number): Promise<ActionResult<undefined>> {
  const result = await runAction(async (actor) => {
    const keyId = Number(id);
    if (!Number.isInteger(keyId) || keyId <= 0) throw notFound("No such API key");
    await revokeApiKey(actor, keyId);
    return undefined;
  });
  if (result.ok) revalidatePath("/admin/api-keys");
  return result;
}
