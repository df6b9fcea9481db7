import { Upload } from "@/models";

/** A processing upload whose job will be retried goes back to queued, with the reason. */
export async function markUploadRetrying(uploadId: number, message: string): Promise<void> {
  await Upload.update({ status: "queued", error: `Retrying after a problem: ${message}` }, { where: { id: uploadId, status: "processing" } });
}

/** Who submitted an upload (null for an API key), to credit the diagnosis it triggers. */
export async function findUploadSubmitter(uploadId: number): Promise<number | null> {
  const upload = await Upload.findByPk(uploadId, { attributes: ["created_by"] });
  return upload?.created_by ?? null;
}
