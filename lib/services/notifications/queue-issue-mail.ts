// E-mail about an issue leaves after the triage transaction commits, through
// the notify queue (retries with backoff). If Redis cannot take the job the
// mail is sent from here in the background; a mail problem is logged and
// never fails the triage action.
import { QUEUES, DEFAULT_JOB_OPTIONS } from "@/lib/queue/jobs";
import { getQueue } from "@/lib/queue/queues";
import { pingRedis } from "@/lib/queue/connection";
import { IssueMailJobSchema, type IssueMailJob } from "@/lib/validations/notify-job";
import { sendIssueMail } from "./send-issue-mail";

export async function queueIssueMail(job: IssueMailJob): Promise<"queued" | "sent-directly"> {
  const data = IssueMailJobSchema.parse(job);
  try {
    await pingRedis(); // waits (briefly) for the connection; it does not queue commands offline
    await getQueue(QUEUES.notify).add(`issue-${data.kind}`, data, DEFAULT_JOB_OPTIONS);
    return "queued";
  } catch (e) {
    console.warn(`[notify] queue unavailable (${(e as Error).message}); sending issue ${data.issueId} mail directly`);
    void sendIssueMail(data).catch((err: Error) => console.error(`[notify] mail for issue ${data.issueId} failed: ${err.message}`));
    return "sent-directly";
  }
}
