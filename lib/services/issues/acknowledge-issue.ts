import type { Actor } from "@/lib/auth/actor";
import { applyTransition, type IssueChangeResult } from "./apply-transition";

/** An engineer (or admin) has seen the issue: new or recurred → acknowledged. */
export async function acknowledgeIssue(actor: Actor, issueId: number): Promise<IssueChangeResult> {
  return applyTransition(actor, issueId, "acknowledge", () => ({ patch: {} }));
}
