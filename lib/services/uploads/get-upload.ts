import { requireCapability, type Actor } from "@/lib/auth/actor";
import { buildUploadView } from "./build-upload-view";
import { findOwnUpload } from "./find-own-upload";
import type { UploadView } from "./upload-view";

/** One upload of the actor's organization with its progress and counts. */
export async function getUpload(actor: Actor, id: number): Promise<UploadView> {
  requireCapability(actor, "uploads.read");
  return buildUploadView(actor, await findOwnUpload(actor, id));
}
