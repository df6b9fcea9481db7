// The Bellows worker process: one BullMQ Worker per queue. Several of these
// processes may run against the same Redis and PostgreSQL. Stops cleanly on
// SIGTERM/SIGINT (finishes or hands back the jobs it holds).
import { Worker } from "bullmq";
import { workerConnection } from "@/lib/queue/connection";
import { sequelize } from "@/models";
import { PROCESSORS } from "./registry";

const workers: Worker[] = PROCESSORS.map(
  (p) =>
    new Worker(p.queue, p.process, {
      connection: workerConnection(),
      concurrency: p.concurrency ?? 1,
      lockDuration: 60_000,
    }),
);

for (const w of workers) {
  w.on("failed", (job, err) => console.error(`[worker] ${w.name} job ${job?.id} failed: ${err.message}`));
  w.on("error", (err) => console.error(`[worker] ${w.name}: ${err.message}`));
}

void Promise.all(PROCESSORS.map((p) => p.onStart?.())).then(() =>
  console.log(`[worker] up: ${workers.map((w) => w.name).join(", ") || "no queues"}`),
);

let stopping = false;
async function stop(signal: string) {
  if (stopping) return;
  stopping = true;
  console.log(`[worker] ${signal}: closing`);
  await Promise.allSettled(workers.map((w) => w.close()));
  await sequelize.close().catch(() => undefined);
  process.exit(0);
}
process.on("SIGTERM", () => void stop("SIGTERM"));
process.on("SIGINT", () => void stop("SIGINT"));
