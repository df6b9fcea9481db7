// Issue list queries, triage inputs and labels shared by the pages, route
// handlers, server actions and services (one schema per boundary input).
import { z } from "zod";
import { RULE_KEYS, type RuleKey } from "@/lib/diagnostics/types";

// The same list as models/issue.ts and the issues migration; repeated here so
// client components can import this file without pulling in the models.
export const ISSUE_STATUSES = ["new", "acknowledged", "assigned", "resolved", "verified", "recurred", "dismissed", "shelved"] as const;
export type IssueStatus = (typeof ISSUE_STATUSES)[number];

/** Statuses the ranked list shows when no status filter is given. */
export const OPEN_STATUSES: IssueStatus[] = ["new", "acknowledged", "assigned", "recurred"];

export const RULE_LABEL: Record<RuleKey, string> = {
  multipointing: "Multipointing",
  heading: "Heading",
  valve_leak: "Valve stuck open or leaking",
  liquid_loading: "Liquid loading",
  frac_hit: "Frac hit / reload",
  over_injection: "Over-injection",
  fast_kickoff: "Kick-off too fast",
  data_quality: "Data quality",
};

export function ruleLabel(rule: string): string {
  return (RULE_LABEL as Record<string, string>)[rule] ?? rule.replace(/_/g, " ");
}

export const STATUS_LABEL: Record<IssueStatus, string> = {
  new: "New",
  acknowledged: "Acknowledged",
  assigned: "Assigned",
  resolved: "Resolved",
  verified: "Verified",
  recurred: "Recurred",
  dismissed: "Dismissed",
  shelved: "Shelved",
};

export const PRIORITIES = ["low", "normal", "high", "urgent"] as const;
export const DISMISS_REASONS = ["false_alarm", "known_accepted", "data_problem"] as const;
export const DISMISS_REASON_LABEL: Record<(typeof DISMISS_REASONS)[number], string> = {
  false_alarm: "False alarm",
  known_accepted: "Known and accepted",
  data_problem: "Data problem",
};

export const DEFAULT_RESOLUTION_ACTIONS = [
  "Injection rate changed",
  "Valve change-out scheduled",
  "Choke adjusted",
  "Surface leak repaired",
  "Well test requested",
  "Other",
];

export const ISSUE_SORTS = ["risk", "severity", "since", "duration", "well", "status", "lastChange"] as const;
export type IssueSort = (typeof ISSUE_SORTS)[number];

const optionalId = z.preprocess((v) => (v === "" || v == null ? undefined : v), z.coerce.number().int().positive().optional());
const optionalText = z.preprocess((v) => (v === "" || v == null ? undefined : v), z.string().optional());

/** The ranked list's query, as it appears in the URL (all strings) or as an object. */
export const IssueQuerySchema = z.object({
  field: optionalId,
  pad: optionalId,
  rule: z.preprocess((v) => (v === "" || v == null ? undefined : v), z.enum(RULE_KEYS).optional()),
  /** Comma-separated statuses, or "all"; empty means the open statuses. */
  status: optionalText.pipe(
    z.string().refine((s) => s === "all" || s.split(",").every((x) => (ISSUE_STATUSES as readonly string[]).includes(x)), "unknown status").optional(),
  ),
  /** A user id, "me" or "none". */
  assignee: optionalText.pipe(z.string().regex(/^(\d+|me|none)$/, "use a person's id, me or none").optional()),
  /** Issues that started on or after this date (YYYY-MM-DD). */
  since: optionalText.pipe(z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "use YYYY-MM-DD").optional()),
  sort: z.preprocess((v) => (v === "" || v == null ? undefined : v), z.enum(ISSUE_SORTS).default("risk")),
  dir: z.preprocess((v) => (v === "" || v == null ? undefined : v), z.enum(["asc", "desc"]).default("desc")),
  page: z.preprocess((v) => (v === "" || v == null ? undefined : v), z.coerce.number().int().min(1).max(100_000).default(1)),
  pageSize: z.preprocess((v) => (v === "" || v == null ? undefined : v), z.coerce.number().int().min(1).max(200).default(50)),
});
export type IssueQuery = z.infer<typeof IssueQuerySchema>;
export type IssueQueryInput = z.input<typeof IssueQuerySchema>;

/** The query keys in URL order (saved filters and the export link use them). */
export const ISSUE_QUERY_KEYS = ["field", "pad", "rule", "status", "assignee", "since", "sort", "dir", "page", "pageSize"] as const;

export function issueQueryFromSearchParams(sp: URLSearchParams | Record<string, string | string[] | undefined>): Record<string, string | undefined> {
  const out: Record<string, string | undefined> = {};
  for (const k of ISSUE_QUERY_KEYS) {
    const v = sp instanceof URLSearchParams ? sp.get(k) : sp[k];
    out[k] = Array.isArray(v) ? v[0] : (v ?? undefined);
  }
  return out;
}

export const IssueIdSchema = z.coerce.number().int().positive();

const futureOrTodayDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "use YYYY-MM-DD");

export const AssignIssueSchema = z.object({
  assigneeId: z.coerce.number().int().positive({ message: "choose an operator" }),
  priority: z.enum(PRIORITIES).default("normal"),
  dueOn: z.preprocess((v) => (v === "" || v == null ? undefined : v), futureOrTodayDate.optional()),
});
export type AssignIssueInput = z.input<typeof AssignIssueSchema>;

export const ResolveIssueSchema = z.object({
  action: z.string().trim().min(1, "choose what was done").max(80),
  note: z.string().trim().max(2000).default(""),
});

export const DismissIssueSchema = z.object({
  reason: z.enum(DISMISS_REASONS, { message: "choose a reason" }),
  note: z.preprocess((v) => (v === "" || v == null ? undefined : v), z.string().trim().max(2000).optional()),
});

export const ShelveIssueSchema = z.object({
  /** A date (YYYY-MM-DD, end of that day UTC) or a full ISO time; must be in the future. */
  until: z.string().min(1, "choose a date"),
});

export const CommentSchema = z.object({ body: z.string().trim().min(1, "write something").max(4000) });

export const BulkTriageSchema = z.object({
  ids: z.array(z.coerce.number().int().positive()).min(1, "select at least one issue").max(500),
  kind: z.enum(["acknowledge", "assign"]),
  assigneeId: z.coerce.number().int().positive().optional(),
  priority: z.enum(PRIORITIES).optional(),
  dueOn: z.string().regex(/^\d{4}-\d{2}-\d{2}$/).optional(),
});
export type BulkTriageInput = z.input<typeof BulkTriageSchema>;

export const ResolutionActionsSchema = z
  .array(z.string().trim().min(1).max(80))
  .min(1, "keep at least one action")
  .max(30)
  .refine((a) => new Set(a.map((x) => x.toLowerCase())).size === a.length, "each action once");

export const SavedFilterSchema = z.object({
  name: z.string().trim().min(1, "name the filter").max(80),
  query: z.string().max(1000),
});

export const NotificationPreferencesSchema = z.object({
  email: z.object({ assigned: z.boolean(), resolved: z.boolean(), digest: z.boolean() }),
});
export type NotificationPreferences = z.infer<typeof NotificationPreferencesSchema>;
export const DEFAULT_NOTIFICATION_PREFERENCES: NotificationPreferences = { email: { assigned: true, resolved: true, digest: true } };
