// The worker's side of an issue e-mail: read the issue and the person now
// (they may have switched the mail off since), then send. Safe to run twice:
// the worst case is a second copy of a short message.
import { Issue, Pad, User, Well } from "@/models";
import { appUrl, sendMail } from "@/lib/mail/send-mail";
import { ruleLabel } from "@/lib/validations/issues";
import type { IssueMailJob } from "@/lib/validations/notify-job";
import { readNotificationPreferences } from "./read-notification-preferences";

export async function sendIssueMail(job: IssueMailJob): Promise<"sent" | "skipped"> {
  const [issue, recipient, by] = await Promise.all([
    Issue.findOne({ where: { id: job.issueId, organization_id: job.organizationId }, include: [{ model: Well, as: "well", include: [{ model: Pad, as: "pad" }] }] }),
    User.findOne({ where: { id: job.recipientId, organization_id: job.organizationId } }),
    job.actorId ? User.findOne({ where: { id: job.actorId, organization_id: job.organizationId }, attributes: ["name"] }) : null,
  ]);
  if (!issue || !recipient || !recipient.active) return "skipped";
  if (!readNotificationPreferences(recipient.preferences).email[job.kind]) return "skipped";
  const well = (issue as unknown as { well: Well & { pad: Pad } }).well;
  const what = `${ruleLabel(issue.rule)} on ${well.name}`;
  const link = appUrl(`/issues/${issue.id}`);
  const risk = `${Math.round(issue.production_at_risk)} ${issue.production_at_risk_unit} at risk`;
  if (job.kind === "assigned") {
    await sendMail({
      to: recipient.email,
      subject: `Assigned to you: ${what}`,
      text: [
        `${by?.name ?? "An engineer"} assigned you an issue on pad ${well.pad.name}.`,
        `${issue.summary}`,
        `${risk}.${issue.priority ? ` Priority: ${issue.priority}.` : ""}${issue.due_on ? ` Due: ${issue.due_on}.` : ""}`,
        `Open it: ${link}`,
      ].join("\n\n"),
    });
  } else {
    await sendMail({
      to: recipient.email,
      subject: `Resolved: ${what}`,
      text: [
        `${by?.name ?? "The operator"} resolved the issue.`,
        `Action: ${issue.resolved_action ?? "not given"}`,
        issue.resolved_note ? `Note: ${issue.resolved_note}` : "",
        `Bellows keeps watching the trends; the issue comes back as recurred if the signature returns.`,
        `Open it: ${link}`,
      ].filter(Boolean).join("\n\n"),
    });
  }
  return "sent";
}
