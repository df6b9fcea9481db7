import type { Readable } from "node:stream";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { notFound } from "@/lib/errors";
import { getStorage } from "@/lib/storage/get-storage";
import { StorageNotFoundError } from "@/lib/storage/object-storage";
import { findOwnUpload } from "./find-own-upload";

/** The rejected-rows CSV (row, column, raw, reason, message) as a stream; 404 when the import refused nothing. */
export async function openRejections(actor: Actor, id: number): Promise<Readable> {
  requireCapability(actor, "uploads.read");
  const u = await findOwnUpload(actor, id);
  if (!u.rejections_key) throw notFound("This upload has no rejected rows");
  try {
    return await getStorage().get(u.rejections_key);
  } catch (e) {
    if (e instanceof StorageNotFoundError) throw notFound("The rejected-rows file is no longer stored");
    throw e;
  }
}
