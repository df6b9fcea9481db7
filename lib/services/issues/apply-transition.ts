// Shared body of every single-issue transition: capability, organization
// (404), row lock, the transition table, the update, history + audit, and
// in-app notifications, all in one transaction; e-mail only after commit.
import type { Transaction } from "sequelize";
import { sequelize, type Issue } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import type { IssueStatus } from "@/lib/validations/issues";
import { checkTransition, TRANSITIONS, type TriageAction } from "./issue-transitions";
import { findIssueForActor } from "./find-issue-for-actor";
import { recordIssueChange } from "./record-issue-change";

export interface IssueChangeResult {
  id: number;
  status: IssueStatus;
}

export interface TransitionPlan {
  patch: Partial<Pick<Issue, "assignee_id" | "priority" | "due_on" | "resolved_action" | "resolved_note" | "resolved_at" | "resolved_by" | "dismiss_reason" | "shelved_until">>;
  data?: Record<string, unknown>;
  /** Runs inside the transaction after the update (e.g. in-app notifications). */
  inside?: (issue: Issue, t: Transaction) => Promise<void>;
  /** Runs after commit (e-mail); must not throw. */
  afterCommit?: (issue: Issue) => Promise<void>;
}

export async function applyTransition(
  actor: Actor,
  issueId: number,
  action: TriageAction,
  plan: (issue: Issue, t: Transaction) => Promise<TransitionPlan> | TransitionPlan,
): Promise<IssueChangeResult> {
  requireCapability(actor, TRANSITIONS[action].capability);
  let after: TransitionPlan["afterCommit"];
  const issue = await sequelize.transaction(async (t) => {
    const issue = await findIssueForActor(actor, issueId, { transaction: t, lock: true });
    const from = issue.status;
    checkTransition(action, from);
    const p = await plan(issue, t);
    const to = TRANSITIONS[action].to(issue);
    const before = { status: from, ...Object.fromEntries(Object.keys(p.patch).map((k) => [k, issue.get(k as keyof Issue)])) };
    await issue.update({ ...p.patch, status: to }, { transaction: t });
    await recordIssueChange(actor, issue, { kind: action, from, to, data: p.data, before, after: { status: to, ...p.patch } }, t);
    await p.inside?.(issue, t);
    after = p.afterCommit;
    return issue;
  });
  if (after) {
    try {
      await after(issue);
    } catch (e) {
      console.error(`[issues] after ${action} of issue ${issue.id}:`, e);
    }
  }
  return { id: issue.id, status: issue.status };
}
