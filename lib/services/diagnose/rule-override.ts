// The stored shape of one level of rule settings (organization, field or well):
// only the numbers set at that level, by group, plus the issue lifecycle group.
// Validation goes through the engine's RuleSettingsSchema (ranges and types) and
// IssueLifecycleSchema; unknown groups or names are refused, not silently dropped.
// Pure: used by the form in the browser and by the save service on the server.
import { DEFAULT_SETTINGS, RuleSettingsSchema, type RuleSettingsOverride } from "@/lib/diagnostics/settings";
import { DEFAULT_LIFECYCLE, IssueLifecycleSchema, type IssueLifecycleOverride } from "./lifecycle-settings";

export type StoredRuleOverride = RuleSettingsOverride & { lifecycle?: IssueLifecycleOverride };

export interface OverrideIssue {
  path: string;
  message: string;
}

export type ParsedOverride = { ok: true; value: StoredRuleOverride } | { ok: false; issues: OverrideIssue[] };

const GROUPS: Record<string, Record<string, unknown>> = {
  ...(DEFAULT_SETTINGS as unknown as Record<string, Record<string, unknown>>),
  lifecycle: DEFAULT_LIFECYCLE as unknown as Record<string, unknown>,
};

export function parseRuleOverride(input: unknown): ParsedOverride {
  const issues: OverrideIssue[] = [];
  const value: Record<string, Record<string, number>> = {};
  if (input === null || input === undefined) return { ok: true, value: {} };
  if (typeof input !== "object" || Array.isArray(input)) return { ok: false, issues: [{ path: "", message: "Settings must be an object of groups" }] };
  for (const [group, values] of Object.entries(input as Record<string, unknown>)) {
    const known = GROUPS[group];
    if (!known) { issues.push({ path: group, message: `Unknown settings group "${group}"` }); continue; }
    if (values === null || values === undefined) continue;
    if (typeof values !== "object" || Array.isArray(values)) { issues.push({ path: group, message: "Must be an object of numbers" }); continue; }
    for (const [name, v] of Object.entries(values as Record<string, unknown>)) {
      if (v === null || v === undefined || v === "") continue;
      if (!(name in known)) { issues.push({ path: `${group}.${name}`, message: `Unknown setting "${name}"` }); continue; }
      if (typeof v !== "number" || !Number.isFinite(v)) { issues.push({ path: `${group}.${name}`, message: "Must be a number" }); continue; }
      (value[group] ??= {})[name] = v;
    }
  }
  const { lifecycle, ...rules } = value;
  const r = RuleSettingsSchema.safeParse(rules);
  if (!r.success) for (const i of r.error.issues) issues.push({ path: i.path.join("."), message: i.message });
  const l = IssueLifecycleSchema.safeParse(lifecycle ?? {});
  if (!l.success) for (const i of l.error.issues) issues.push({ path: ["lifecycle", ...i.path].join("."), message: i.message });
  if (issues.length) return { ok: false, issues };
  return { ok: true, value: value as StoredRuleOverride };
}

/** Read a stored JSONB value leniently (rows written before a setting was renamed keep working). */
export function readStoredOverride(raw: unknown): StoredRuleOverride {
  const out: Record<string, Record<string, number>> = {};
  if (!raw || typeof raw !== "object") return {};
  for (const [group, values] of Object.entries(raw as Record<string, unknown>)) {
    const known = GROUPS[group];
    if (!known || !values || typeof values !== "object") continue;
    for (const [name, v] of Object.entries(values as Record<string, unknown>)) {
      if (name in known && typeof v === "number" && Number.isFinite(v)) (out[group] ??= {})[name] = v;
    }
  }
  return out as StoredRuleOverride;
}
