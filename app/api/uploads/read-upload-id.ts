import { notFound } from "@/lib/errors";

/** An id from the URL: anything but a positive integer is simply not found. */
export function readUploadId(raw: string): number {
  const id = Number(raw);
  if (!Number.isInteger(id) || id <= 0) throw notFound("Upload not found");
  return id;
}
