import { requireCapability, type Actor } from "@/lib/auth/actor";
import { TRANSITIONS } from "./issue-transitions";
import { AppError } from "@/lib/errors";
import { parseOrThrow } from "@/lib/http";
import { ShelveIssueSchema } from "@/lib/validations/issues";
import { applyTransition, type IssueChangeResult } from "./apply-transition";

/** A date alone means the end of that day (UTC); a full time is taken as given. */
export function readShelveUntil(until: string): Date {
  const d = /^\d{4}-\d{2}-\d{2}$/.test(until) ? new Date(`${until}T23:59:59.999Z`) : new Date(until);
  if (Number.isNaN(d.getTime())) throw new AppError("invalid", "The shelve date is not a date", [{ path: "until", message: "not a date" }]);
  if (d.getTime() <= Date.now()) throw new AppError("invalid", "Shelve until a future date", [{ path: "until", message: "must be in the future" }]);
  return d;
}

/** Hide the issue from the ranked list until a future date (ISA-18.2 "shelved"). */
export async function shelveIssue(actor: Actor, issueId: number, input: unknown): Promise<IssueChangeResult> {
  requireCapability(actor, TRANSITIONS.shelve.capability); // before reading input: a refused role learns nothing
  const data = parseOrThrow(ShelveIssueSchema, input);
  const until = readShelveUntil(data.until);
  return applyTransition(actor, issueId, "shelve", () => ({ patch: { shelved_until: until }, data: { until: until.toISOString() } }));
}
