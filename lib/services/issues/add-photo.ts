import { randomUUID } from "node:crypto";
import { Readable } from "node:stream";
import { IssueAttachment, sequelize } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { AppError } from "@/lib/errors";
import { getStorage } from "@/lib/storage/get-storage";
import { detectImageType, MAX_PHOTO_BYTES, PHOTO_TYPES, photoExtension, type PhotoType } from "@/lib/validations/image-signature";
import { findIssueForActor } from "./find-issue-for-actor";
import { recordIssueChange } from "./record-issue-change";

export interface PhotoInput {
  fileName: string;
  contentType: string;
  bytes: Uint8Array;
}

function cleanFileName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? "photo";
  return base.replace(/[^\w.\- ]+/g, "_").slice(0, 200) || "photo";
}

/**
 * A photo from the field on an issue: JPEG, PNG or WebP up to 5 MB. The
 * declared type must be one of those AND match the file's own first bytes,
 * so a renamed script is refused. Stored through lib/storage; served only by
 * the route that checks organization and role again.
 */
export async function addPhoto(actor: Actor, issueId: number, input: PhotoInput): Promise<{ id: number }> {
  requireCapability(actor, "issues.comment");
  const declared = input.contentType.split(";")[0]!.trim().toLowerCase();
  if (!(PHOTO_TYPES as readonly string[]).includes(declared)) {
    throw new AppError("invalid", "Photos must be JPEG, PNG or WebP", [{ path: "photo", message: "type not allowed" }]);
  }
  if (input.bytes.byteLength === 0) throw new AppError("invalid", "The photo is empty", [{ path: "photo", message: "empty" }]);
  if (input.bytes.byteLength > MAX_PHOTO_BYTES) throw new AppError("too_large", "Photos may be at most 5 MB", [{ path: "photo", message: "over 5 MB" }]);
  const actual = detectImageType(input.bytes);
  if (actual !== declared) {
    throw new AppError("invalid", "The file's content is not the image type it claims to be", [{ path: "photo", message: "content does not match type" }]);
  }
  // The issue check comes first: nothing is stored for an issue the person may not touch.
  const issue = await findIssueForActor(actor, issueId);
  const key = `issues/${issue.organization_id}/${issue.id}/${randomUUID()}.${photoExtension(actual as PhotoType)}`;
  await getStorage().put(key, Readable.from(Buffer.from(input.bytes)));
  try {
    return await sequelize.transaction(async (transaction) => {
      const locked = await findIssueForActor(actor, issueId, { transaction });
      const a = await IssueAttachment.create(
        { organization_id: locked.organization_id, issue_id: locked.id, user_id: actor.userId, file_name: cleanFileName(input.fileName), content_type: actual as string, byte_size: input.bytes.byteLength, storage_key: key },
        { transaction },
      );
      await recordIssueChange(actor, locked, { kind: "photo", from: locked.status, to: locked.status, data: { attachmentId: a.id, fileName: a.file_name } }, transaction);
      return { id: a.id };
    });
  } catch (e) {
    await getStorage().delete(key).catch(() => undefined);
    throw e;
  }
}
