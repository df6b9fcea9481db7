import { Upload } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { parseOrThrow } from "@/lib/http";
import { ListUploadsSchema, type ListUploadsInput } from "@/lib/validations/uploads";
import { toUploadSummary, type UploadSummary } from "./upload-view";

/** The organization's uploads, newest first. */
export async function listUploads(actor: Actor, input: ListUploadsInput = {}): Promise<{ uploads: UploadSummary[]; total: number }> {
  requireCapability(actor, "uploads.read");
  const { limit, offset } = parseOrThrow(ListUploadsSchema, input);
  const { rows, count } = await Upload.findAndCountAll({
    where: { organization_id: actor.organizationId },
    attributes: { exclude: ["detection", "mapping"] },
    order: [["created_at", "DESC"], ["id", "DESC"]],
    limit,
    offset,
  });
  return { uploads: rows.map(toUploadSummary), total: count };
}
