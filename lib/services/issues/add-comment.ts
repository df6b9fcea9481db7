import { IssueComment, sequelize } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { parseOrThrow } from "@/lib/http";
import { CommentSchema } from "@/lib/validations/issues";
import { findIssueForActor } from "./find-issue-for-actor";
import { recordIssueChange } from "./record-issue-change";

/** A comment on an issue (engineers, admins, and the operator it is assigned to). */
export async function addComment(actor: Actor, issueId: number, input: unknown): Promise<{ id: number }> {
  requireCapability(actor, "issues.comment");
  const { body } = parseOrThrow(CommentSchema, typeof input === "string" ? { body: input } : input);
  return sequelize.transaction(async (transaction) => {
    const issue = await findIssueForActor(actor, issueId, { transaction });
    const c = await IssueComment.create({ organization_id: issue.organization_id, issue_id: issue.id, user_id: actor.userId, body }, { transaction });
    await recordIssueChange(actor, issue, { kind: "comment", from: issue.status, to: issue.status, data: { commentId: c.id } }, transaction);
    return { id: c.id };
  });
}
