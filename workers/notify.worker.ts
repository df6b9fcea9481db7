// The `notify` queue: issue e-mails queued after a triage change commits,
// and the daily digest as a repeatable job with a stable scheduler id (so
// several worker processes register it once).
import type { Job } from "bullmq";
import { QUEUES } from "@/lib/queue/jobs";
import { getQueue } from "@/lib/queue/queues";
import { pingRedis } from "@/lib/queue/connection";
import { DigestJobSchema, IssueMailJobSchema } from "@/lib/validations/notify-job";
import { sendIssueMail } from "@/lib/services/notifications/send-issue-mail";
import { sendDailyDigest } from "@/lib/services/notifications/send-daily-digest";
import type { Processor } from "./registry";

export const DIGEST_SCHEDULER_ID = "daily-digest";
/** 06:00 UTC every day; DIGEST_CRON overrides it. */
const DIGEST_CRON = process.env.DIGEST_CRON ?? "0 6 * * *";

async function processNotifyJob(job: Job): Promise<unknown> {
  if (job.name === "digest") {
    DigestJobSchema.parse(job.data);
    return sendDailyDigest();
  }
  return sendIssueMail(IssueMailJobSchema.parse(job.data));
}

async function registerDigest(): Promise<void> {
  try {
    await pingRedis(); // the producer connection does not queue commands while connecting
    await getQueue(QUEUES.notify).upsertJobScheduler(DIGEST_SCHEDULER_ID, { pattern: DIGEST_CRON, tz: "UTC" }, { name: "digest", data: { v: 1, kind: "digest" } });
  } catch (e) {
    console.warn(`[notify] could not register the daily digest: ${(e as Error).message}`);
  }
}

export const notifyProcessor: Processor = {
  queue: QUEUES.notify,
  process: processNotifyJob,
  concurrency: 4,
  onStart: registerDigest,
};
