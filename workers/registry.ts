// Every queue the worker serves: add a processor here (one file per queue).
import type { Job } from "bullmq";

export interface Processor {
  queue: string;
  process: (job: Job) => Promise<unknown>;
  concurrency?: number;
  /** Runs once at start-up, e.g. to register repeatable jobs. */
  onStart?: () => Promise<void>;
}

export const PROCESSORS: Processor[] = [];
