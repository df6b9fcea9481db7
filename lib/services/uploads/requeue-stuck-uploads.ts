// The ingest worker's safety net, run at start-up and every minute:
// - uploads 'queued' for a while whose job is not in Redis (Redis was down when they
//   were submitted, or Redis lost its data) are enqueued again;
// - uploads 'processing' with no progress for a long time whose job has ended
//   (the worker was killed on the job's last attempt) are marked failed with a
//   message, instead of spinning forever.
import { Op } from "sequelize";
import type { Queue } from "bullmq";
import { Upload } from "@/models";
import { QUEUES } from "@/lib/queue/jobs";
import { getQueue } from "@/lib/queue/queues";
import { enqueueIngest, ingestJobId } from "./enqueue-ingest";

export interface RequeueOptions {
  queuedForMs?: number;
  silentForMs?: number;
  queue?: Queue;
}

export async function requeueStuckUploads(options: RequeueOptions = {}): Promise<{ requeued: number[]; failed: number[] }> {
  const queue = options.queue ?? getQueue(QUEUES.ingest);
  const now = Date.now();
  const requeued: number[] = [];
  const failed: number[] = [];
  const queued = await Upload.findAll({
    where: { status: "queued", updated_at: { [Op.lt]: new Date(now - (options.queuedForMs ?? 30_000)) } },
    attributes: ["id", "organization_id"],
    order: [["id", "ASC"]],
    limit: 500,
  });
  for (const u of queued) {
    if ((await enqueueIngest(u.id, u.organization_id, queue)) === "added") requeued.push(u.id);
  }
  const silent = await Upload.findAll({
    where: { status: "processing", updated_at: { [Op.lt]: new Date(now - (options.silentForMs ?? 10 * 60_000)) } },
    attributes: ["id", "organization_id"],
    limit: 500,
  });
  for (const u of silent) {
    const job = await queue.getJob(ingestJobId(u.id));
    const state = job ? await job.getState() : "unknown";
    if (state === "active" || state === "waiting" || state === "delayed" || state === "prioritized" || state === "waiting-children") continue;
    const [n] = await Upload.update(
      { status: "failed", error: "The import stopped without finishing (the worker was stopped or ran out of resources). Submit the upload again to retry; values already stored are kept and re-importing does not duplicate them.", finished_at: new Date() },
      { where: { id: u.id, status: "processing" } },
    );
    if (n === 1) failed.push(u.id);
  }
  return { requeued, failed };
}
