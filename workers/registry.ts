// Every queue the worker serves: add a processor here (one file per queue).
import type { Job } from "bullmq";
import { ingestProcessor } from "./ingest.worker";
import { diagnoseProcessor } from "./diagnose.worker";

export interface Processor {
  queue: string;
  process: (job: Job) => Promise<unknown>;
  concurrency?: number;
  /** Runs once at start-up, e.g. to register repeatable jobs. */
  onStart?: () => Promise<void>;
}

import { notifyProcessor } from "./notify.worker";
export const PROCESSORS: Processor[] = [notifyProcessor, ingestProcessor, diagnoseProcessor];
