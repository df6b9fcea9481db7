"use server";
// Thin action for the mapping step: the service validates the mapping with
// MappingSchema, checks role and organization and queues the ingest job.
import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { runAction, type ActionResult } from "@/lib/action-result";
import { notFound } from "@/lib/errors";
import { submitUpload } from "@/lib/services/uploads/submit-upload";
import type { Mapping } from "@/lib/ingest/mapping";

export interface SubmitMappingInput {
  mapping: Mapping;
  saveMappingAs?: string;
  wellMatches?: Record<string, number>;
}

export async function submitMappingAction(uploadId: number, input: SubmitMappingInput): Promise<ActionResult<boolean>> {
  const result = await runAction(async (actor) => {
    const id = Number(uploadId);
    if (!Number.isInteger(id) || id <= 0) throw notFound("Upload not found");
    const saveMappingAs = typeof input?.saveMappingAs === "string" && input.saveMappingAs.trim() ? input.saveMappingAs.trim() : undefined;
    const view = await submitUpload(actor, id, { mapping: input?.mapping, saveMappingAs, wellMatches: input?.wellMatches ?? {} });
    // True when the queue could not be reached: the upload waits and starts by itself.
    return Boolean(view.notice);
  });
  if (!result.ok) return result;
  revalidatePath("/uploads");
  redirect(result.data ? "/uploads?queued=later" : "/uploads");
}
