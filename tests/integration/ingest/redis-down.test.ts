// Redis down when an upload is submitted (documented in submit-upload.ts): the
// upload is kept as 'queued' with a notice, nothing is half-written, and the
// worker's sweep (start-up and every minute) queues it once Redis is back.
import { afterAll, beforeAll, expect, it } from "vitest";
import { closeDb, makeOrg, type TestOrg } from "../helpers";
import { receiveUpload } from "@/lib/services/uploads/receive-upload";
import { submitUpload } from "@/lib/services/uploads/submit-upload";
import { requeueStuckUploads } from "@/lib/services/uploads/requeue-stuck-uploads";
import { ingestJobId } from "@/lib/services/uploads/enqueue-ingest";
import { getQueue } from "@/lib/queue/queues";
import { QUEUES } from "@/lib/queue/jobs";
import { Upload } from "@/models";
import { addWell, LONG_MAPPING, makeLongFile, streamOf } from "./ingest-fixtures";

type QueueGlobals = { __bellowsRedis?: { disconnect(): void }; __bellowsQueues?: Map<string, { close(): Promise<void> }> };
const g = globalThis as unknown as QueueGlobals;
const realRedis = process.env.REDIS_URL;
let org: TestOrg;

/** Point the producer at another Redis: drop the cached connection and queues. */
async function useRedis(url: string | undefined) {
  const closeSoon = (p: Promise<void>) => Promise.race([p.catch(() => undefined), new Promise<void>((r) => setTimeout(r, 1000))]);
  for (const q of g.__bellowsQueues?.values() ?? []) await closeSoon(q.close());
  g.__bellowsQueues = undefined;
  g.__bellowsRedis?.disconnect();
  g.__bellowsRedis = undefined;
  process.env.REDIS_URL = url;
}

beforeAll(async () => {
  org = await makeOrg("redis-down");
  await addWell(org, `RD-${org.organizationId}`);
});
afterAll(async () => {
  await useRedis(realRedis);
  await closeDb();
});

it("keeps the upload queued with a notice while Redis is down, and the sweep queues it later", async () => {
  const file = makeLongFile([`RD-${org.organizationId}`], Date.UTC(2026, 3, 1), 60);
  const view = await receiveUpload(org.actors.analyst, { fileName: "while-down.csv", body: streamOf(file.text), source: "browser" });

  await useRedis("redis://127.0.0.1:9"); // nothing listens on the discard port
  const started = Date.now();
  const submitted = await submitUpload(org.actors.analyst, view.id, { mapping: LONG_MAPPING });
  expect(Date.now() - started).toBeLessThan(5000); // fails fast, no hanging request
  expect(submitted.status).toBe("queued");
  expect(submitted.notice).toMatch(/will start by itself/);
  const row = await Upload.findByPk(view.id);
  expect(row?.status).toBe("queued");
  expect(row?.mapping).toEqual(LONG_MAPPING);

  await useRedis(realRedis);
  const queue = getQueue(QUEUES.ingest);
  await queue.remove(ingestJobId(view.id)).catch(() => undefined);
  const swept = await requeueStuckUploads({ queuedForMs: 0, queue });
  expect(swept.requeued).toContain(view.id);
  const job = await queue.getJob(ingestJobId(view.id));
  expect(job?.data).toEqual({ v: 1, uploadId: view.id, organizationId: org.organizationId });
  // A second sweep finds the job already there and adds nothing.
  expect((await requeueStuckUploads({ queuedForMs: 0, queue })).requeued).not.toContain(view.id);
  await job?.remove().catch(() => undefined);
});
