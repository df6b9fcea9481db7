import { requireCapability, type Actor } from "@/lib/auth/actor";
import { TRANSITIONS } from "./issue-transitions";
import { AppError } from "@/lib/errors";
import { parseOrThrow } from "@/lib/http";
import { AssignIssueSchema, ruleLabel } from "@/lib/validations/issues";
import { createNotification } from "@/lib/services/notifications/create-notification";
import { queueIssueMail } from "@/lib/services/notifications/queue-issue-mail";
import { applyTransition, type IssueChangeResult } from "./apply-transition";
import { findOrgOperator } from "./find-org-operator";

function todayUtc(): string {
  return new Date().toISOString().slice(0, 10);
}

/** Hand the issue to an operator with a priority and an optional due date; tells the operator. */
export async function assignIssue(actor: Actor, issueId: number, input: unknown): Promise<IssueChangeResult> {
  requireCapability(actor, TRANSITIONS.assign.capability); // before reading input: a refused role learns nothing
  const data = parseOrThrow(AssignIssueSchema, input);
  if (data.dueOn && data.dueOn < todayUtc()) {
    throw new AppError("invalid", "The due date is in the past", [{ path: "dueOn", message: "choose today or later" }]);
  }
  return applyTransition(actor, issueId, "assign", async (issue, t) => {
    const operator = await findOrgOperator(actor.organizationId, data.assigneeId, t);
    return {
      patch: { assignee_id: operator.id, priority: data.priority, due_on: data.dueOn ?? null },
      data: { assigneeId: operator.id, assigneeName: operator.name, priority: data.priority, dueOn: data.dueOn ?? null },
      inside: async (i, tx) =>
        createNotification(
          { organizationId: i.organization_id, userId: operator.id, kind: "issue.assigned", title: `Assigned to you: ${ruleLabel(i.rule)} (issue #${i.id})`, body: i.summary, link: `/issues/${i.id}` },
          tx,
        ),
      afterCommit: async (i) => {
        await queueIssueMail({ v: 1, kind: "assigned", organizationId: i.organization_id, issueId: i.id, recipientId: operator.id, actorId: actor.userId });
      },
    };
  });
}
