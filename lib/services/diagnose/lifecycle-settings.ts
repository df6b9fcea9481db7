// How findings become issues over time (hysteresis), tunable like the rule settings
// and stored beside them (rule_settings.settings.lifecycle, same cascade). Pure: no
// models, so the settings form can validate with it in the browser too.
//
// - closeAfterMinutes: an issue's signature must be absent this long (in data) before
//   the issue is marked ended; a brief clear spell does not close it.
// - quietGapMinutes: after a dismissed issue's signature ended, a return within this
//   gap extends that issue (still dismissed) instead of opening a new one.
// - resolveGraceMinutes: signature seen up to this long after "resolved" is the tail
//   of the old episode (the fix takes effect, the rules' windows lag), not a return.
// - verifyAfterMinutes: a resolved issue whose signature stays absent for this much
//   data after resolved_at becomes "verified".
// - recurrenceWindowDays: a return within this after resolved_at makes the resolved
//   (or verified) issue "recurred"; a return later is a new issue.
import { z } from "zod";

export const IssueLifecycleSchema = z.object({
  closeAfterMinutes: z.number().int().positive().max(7 * 1440).default(120),
  quietGapMinutes: z.number().int().min(0).max(14 * 1440).default(360),
  resolveGraceMinutes: z.number().int().min(0).max(1440).default(120),
  verifyAfterMinutes: z.number().int().positive().max(30 * 1440).default(1440),
  recurrenceWindowDays: z.number().int().positive().max(365).default(30),
});

export type IssueLifecycle = z.infer<typeof IssueLifecycleSchema>;
export type IssueLifecycleOverride = Partial<IssueLifecycle>;

export const DEFAULT_LIFECYCLE: IssueLifecycle = IssueLifecycleSchema.parse({});

export const LIFECYCLE_KEYS = Object.keys(DEFAULT_LIFECYCLE) as (keyof IssueLifecycle)[];

/** Organization → field → well, number by number, like mergeSettings for the rules. */
export function mergeLifecycle(...levels: (IssueLifecycleOverride | null | undefined)[]): IssueLifecycle {
  const merged: Record<string, unknown> = {};
  for (const level of levels) {
    if (!level) continue;
    for (const [k, v] of Object.entries(level)) if (v !== undefined && v !== null) merged[k] = v;
  }
  return IssueLifecycleSchema.parse(merged);
}
