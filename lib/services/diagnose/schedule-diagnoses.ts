// The hourly sweep: for every organization, bring back shelved issues whose time is
// up, then queue a diagnosis of the last two days (reason "schedule"). Job ids carry
// the organization and the hour, so several workers running the sweep at once (or a
// retried sweep) queue each diagnosis only once.
import { Organization } from "@/models";
import { QUEUES } from "@/lib/queue/jobs";
import { getQueue } from "@/lib/queue/queues";
import { DiagnoseRunJobSchema } from "./diagnose-run-job";
import { unshelveExpiredIssues } from "./unshelve-expired-issues";

const HOUR_MS = 3_600_000;
export const SCHEDULE_DAYS = 2;

export async function scheduleDiagnoses(now = Date.now()): Promise<{ organizations: number; unshelved: number }> {
  const orgs = await Organization.findAll({ attributes: ["id"] });
  const hour = Math.floor(now / HOUR_MS);
  let unshelved = 0;
  for (const org of orgs) {
    unshelved += await unshelveExpiredIssues(org.id, now);
    const data = DiagnoseRunJobSchema.parse({ v: 1, organizationId: org.id, from: now - SCHEDULE_DAYS * 86_400_000, to: now, reason: "schedule", requestedBy: null });
    await getQueue(QUEUES.diagnose).add("diagnose", data, { jobId: `schedule-${org.id}-${hour}` });
  }
  return { organizations: orgs.length, unshelved };
}
