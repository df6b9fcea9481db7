import { UniqueConstraintError } from "sequelize";
import type { Actor } from "@/lib/auth/actor";
import { AppError } from "@/lib/errors";
import { applyTransition, type IssueChangeResult } from "./apply-transition";

/**
 * Bring a resolved, verified, dismissed or shelved issue back into the open list
 * (to assigned when someone still holds it, else acknowledged). Only one live
 * issue per well and rule may exist, so a newer open one blocks the reopen.
 */
export async function reopenIssue(actor: Actor, issueId: number): Promise<IssueChangeResult> {
  try {
    return await applyTransition(actor, issueId, "reopen", () => ({ patch: { shelved_until: null, dismiss_reason: null } }));
  } catch (e) {
    if (e instanceof UniqueConstraintError) {
      throw new AppError("conflict", "A newer open issue for this well and problem already exists; work on that one instead");
    }
    throw e;
  }
}
