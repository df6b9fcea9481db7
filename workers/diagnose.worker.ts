// The `diagnose` queue: run one diagnosis (lib/services/diagnose/run-diagnosis.ts)
// for jobs queued by the ingest worker, the sample API, a person's re-run request or
// the hourly sweep, which itself runs here as the repeatable job "diagnose-sweep".
//
// Safe to run twice: runDiagnosis only upserts (issues are extended, not duplicated),
// and a retried job finds its diagnose_runs row by run id or job id. A payload that
// does not validate fails at once (no retry): retrying cannot fix it.
import { UnrecoverableError, type Job } from "bullmq";
import { QUEUES } from "@/lib/queue/jobs";
import { getQueue } from "@/lib/queue/queues";
import { DiagnoseRunJobSchema, SWEEP_JOB_NAME, SWEEP_SCHEDULER_ID } from "@/lib/services/diagnose/diagnose-run-job";
import { runDiagnosis } from "@/lib/services/diagnose/run-diagnosis";
import { scheduleDiagnoses } from "@/lib/services/diagnose/schedule-diagnoses";
import type { Processor } from "./registry";

const SWEEP_EVERY_MS = Number(process.env.DIAGNOSE_SWEEP_EVERY_MS ?? 3_600_000);

async function processDiagnoseJob(job: Job): Promise<unknown> {
  if (job.name === SWEEP_JOB_NAME) return scheduleDiagnoses();
  const parsed = DiagnoseRunJobSchema.safeParse(job.data);
  if (!parsed.success) throw new UnrecoverableError(`Invalid diagnose job: ${parsed.error.issues.map((i) => `${i.path.join(".")} ${i.message}`).join("; ")}`);
  const summary = await runDiagnosis(
    parsed.data,
    // Progress also keeps the job's lock fresh on long runs.
    (p) => job.updateProgress(p).then(() => undefined),
    { jobId: parsed.data.runId ? undefined : String(job.id) },
  );
  const { runId, wellsDone, issuesOpened, issuesUpdated, recurred, verified, fieldEventsCreated } = summary;
  return { runId, wellsDone, issuesOpened, issuesUpdated, recurred, verified, fieldEventsCreated };
}

/** One scheduler id for every worker process: registering it again only updates it. */
async function registerSweep(): Promise<void> {
  await getQueue(QUEUES.diagnose).upsertJobScheduler(SWEEP_SCHEDULER_ID, { every: SWEEP_EVERY_MS }, { name: SWEEP_JOB_NAME, data: { v: 1 }, opts: { removeOnComplete: { count: 48 }, removeOnFail: { count: 48 } } });
}

export const diagnoseProcessor: Processor = {
  queue: QUEUES.diagnose,
  process: processDiagnoseJob,
  concurrency: Number(process.env.DIAGNOSE_CONCURRENCY ?? 1),
  onStart: () => registerSweep().catch((e: Error) => console.warn(`[diagnose] could not register the hourly sweep: ${e.message}`)),
};
