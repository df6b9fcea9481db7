// Producer side: one Queue per name, reused across requests.
import { Queue } from "bullmq";
import { producerConnection } from "./connection";
import { DEFAULT_JOB_OPTIONS, QUEUES } from "./jobs";

type QueueName = (typeof QUEUES)[keyof typeof QUEUES];
const g = globalThis as unknown as { __bellowsQueues?: Map<QueueName, Queue> };

export function getQueue(name: QueueName): Queue {
  g.__bellowsQueues ??= new Map();
  let q = g.__bellowsQueues.get(name);
  if (!q) {
    q = new Queue(name, { connection: producerConnection(), defaultJobOptions: DEFAULT_JOB_OPTIONS });
    q.on("error", () => undefined);
    g.__bellowsQueues.set(name, q);
  }
  return q;
}
