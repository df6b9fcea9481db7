// The one way services load an issue for a person: inside their organization,
// and for an operator only when it is assigned to them. Anything else is 404,
// so a foreign id reveals nothing.
import type { Transaction } from "sequelize";
import { Issue } from "@/models";
import type { Actor } from "@/lib/auth/actor";
import { notFound } from "@/lib/errors";

export async function findIssueForActor(
  actor: Actor,
  issueId: number,
  opts: { transaction?: Transaction; lock?: boolean } = {},
): Promise<Issue> {
  if (!Number.isInteger(issueId) || issueId <= 0) throw notFound("Issue not found");
  const issue = await Issue.findOne({
    where: { id: issueId, organization_id: actor.organizationId },
    transaction: opts.transaction,
    lock: opts.lock && opts.transaction ? opts.transaction.LOCK.UPDATE : undefined,
  });
  if (!issue) throw notFound("Issue not found");
  if (actor.role === "operator" && issue.assignee_id !== actor.userId) throw notFound("Issue not found");
  return issue;
}
