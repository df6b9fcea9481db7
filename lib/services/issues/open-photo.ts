import type { Readable } from "node:stream";
import { IssueAttachment } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { notFound } from "@/lib/errors";
import { getStorage } from "@/lib/storage/get-storage";
import { StorageNotFoundError } from "@/lib/storage/object-storage";
import { findIssueForActor } from "./find-issue-for-actor";

/** A stored photo of an issue the actor may see; 404 for anything else. */
export async function openPhoto(actor: Actor, issueId: number, photoId: number): Promise<{ body: Readable; contentType: string; fileName: string; byteSize: number }> {
  requireCapability(actor, "issues.read");
  const issue = await findIssueForActor(actor, issueId);
  if (!Number.isInteger(photoId) || photoId <= 0) throw notFound("Photo not found");
  const a = await IssueAttachment.findOne({ where: { id: photoId, issue_id: issue.id, organization_id: actor.organizationId } });
  if (!a) throw notFound("Photo not found");
  try {
    return { body: await getStorage().get(a.storage_key), contentType: a.content_type, fileName: a.file_name, byteSize: a.byte_size };
  } catch (e) {
    if (e instanceof StorageNotFoundError) throw notFound("Photo not found");
    throw e;
  }
}
