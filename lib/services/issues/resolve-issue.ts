import { IssueEvent } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { TRANSITIONS } from "./issue-transitions";
import { AppError } from "@/lib/errors";
import { parseOrThrow } from "@/lib/http";
import { ResolveIssueSchema, ruleLabel } from "@/lib/validations/issues";
import { createNotification } from "@/lib/services/notifications/create-notification";
import { queueIssueMail } from "@/lib/services/notifications/queue-issue-mail";
import { applyTransition, type IssueChangeResult } from "./apply-transition";
import { listResolutionActions } from "./list-resolution-actions";

/**
 * The operator records what was done (an action from the organization's list
 * and a note). Operators only on issues assigned to them (others are 404);
 * admins on any. The engineer who assigned it is told.
 */
export async function resolveIssue(actor: Actor, issueId: number, input: unknown): Promise<IssueChangeResult> {
  requireCapability(actor, TRANSITIONS.resolve.capability); // before reading input: a refused role learns nothing
  const data = parseOrThrow(ResolveIssueSchema, input);
  const actions = await listResolutionActions(actor);
  if (!actions.includes(data.action)) {
    throw new AppError("invalid", "Choose one of your organization's resolution actions", [{ path: "action", message: "not in the list" }]);
  }
  return applyTransition(actor, issueId, "resolve", async (issue, t) => {
    // The assigner(s): whoever assigned this issue, latest first; the resolver is not told about their own act.
    const assigns = await IssueEvent.findAll({ where: { issue_id: issue.id, kind: "assign" }, attributes: ["user_id"], order: [["created_at", "DESC"]], transaction: t });
    const recipients = [...new Set(assigns.map((e) => e.user_id).filter((u): u is number => u !== null && u !== actor.userId))];
    return {
      patch: { resolved_action: data.action, resolved_note: data.note || null, resolved_at: new Date(), resolved_by: actor.userId },
      data: { action: data.action, note: data.note || null },
      inside: async (i, tx) => {
        for (const userId of recipients) {
          await createNotification(
            { organizationId: i.organization_id, userId, kind: "issue.resolved", title: `Resolved: ${ruleLabel(i.rule)} (issue #${i.id})`, body: `${data.action}${data.note ? ` — ${data.note}` : ""}`, link: `/issues/${i.id}` },
            tx,
          );
        }
      },
      afterCommit: async (i) => {
        for (const recipientId of recipients) {
          await queueIssueMail({ v: 1, kind: "resolved", organizationId: i.organization_id, issueId: i.id, recipientId, actorId: actor.userId });
        }
      },
    };
  });
}
