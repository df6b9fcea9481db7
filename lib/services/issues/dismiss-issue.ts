import { requireCapability, type Actor } from "@/lib/auth/actor";
import { TRANSITIONS } from "./issue-transitions";
import { parseOrThrow } from "@/lib/http";
import { DismissIssueSchema } from "@/lib/validations/issues";
import { applyTransition, type IssueChangeResult } from "./apply-transition";

/** Not a lift problem worth action: false alarm, known and accepted, or a data problem. */
export async function dismissIssue(actor: Actor, issueId: number, input: unknown): Promise<IssueChangeResult> {
  requireCapability(actor, TRANSITIONS.dismiss.capability); // before reading input: a refused role learns nothing
  const data = parseOrThrow(DismissIssueSchema, input);
  return applyTransition(actor, issueId, "dismiss", () => ({
    patch: { dismiss_reason: data.reason, shelved_until: null },
    data: { reason: data.reason, note: data.note ?? null },
  }));
}
