// "How many issues would these settings have raised over the last N days?" Runs
// the rules on the scope's wells twice, with the current settings and with the
// candidate set at the scope's level, and counts findings per rule and pad-wide
// field events. Writes nothing. The N days end at the newest stored value of the
// scope's wells (data time), with the usual look-back before them.
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { AppError } from "@/lib/errors";
import { RULE_KEYS, type Finding, type RuleKey } from "@/lib/diagnostics/types";
import { loadAlignedSeries } from "@/lib/services/samples/load-aligned-series";
import { diagnoseLoadedPad } from "./diagnose-loaded-pad";
import { findLatestSampleTime } from "./latest-sample-time";
import { loadDiagnosisPads } from "./load-diagnosis-pads";
import { loadSettingsIndex, type ReplaceLevel } from "./load-settings-index";
import { lookbackMs } from "./lookback";
import { parseRuleOverride } from "./rule-override";
import { listScopeWellIds, resolveRuleScope } from "./rule-scope";

const DAY_MS = 86_400_000;

export interface RulePreviewRow {
  rule: RuleKey;
  current: number;
  candidate: number;
}

export interface RulePreview {
  days: number;
  from: string | null;
  to: string | null;
  wells: number;
  wellsWithData: number;
  rules: RulePreviewRow[];
  fieldEvents: { current: number; candidate: number };
}

export async function previewRuleSettings(actor: Actor, input: { scope: unknown; settings: unknown; days?: number }): Promise<RulePreview> {
  requireCapability(actor, "rules.edit");
  const resolved = await resolveRuleScope(actor, input.scope);
  const parsed = parseRuleOverride(input.settings);
  if (!parsed.ok) throw new AppError("invalid", "Some settings are not valid", parsed.issues);
  const days = Math.max(1, Math.min(90, Math.round(input.days ?? 30)));
  const org = actor.organizationId;
  const wellIds = await listScopeWellIds(org, resolved);
  const empty: RulePreview = { days, from: null, to: null, wells: wellIds.length, wellsWithData: 0, rules: RULE_KEYS.map((rule) => ({ rule, current: 0, candidate: 0 })), fieldEvents: { current: 0, candidate: 0 } };
  if (!wellIds.length) return empty;
  const to = await findLatestSampleTime(wellIds);
  if (to === null) return empty;
  const from = to - days * DAY_MS;
  const pads = await loadDiagnosisPads(org, { wellIds });
  const index = await loadSettingsIndex(org);
  const replace: ReplaceLevel = { level: resolved.scope.level, id: resolved.fieldId ?? resolved.wellId ?? undefined, override: parsed.value };
  const current = new Map<RuleKey, number>();
  const candidate = new Map<RuleKey, number>();
  const events = { current: 0, candidate: 0 };
  const allSettings = pads.flatMap((p) => p.wells.flatMap((w) => [index.forWell(p.fieldId, w.id).rules, index.forWell(p.fieldId, w.id, replace).rules]));
  const series = loadAlignedSeries(org, pads.map((p) => p.wells.map((w) => w.id)), from - lookbackMs(allSettings), to + 1);
  let wellsWithData = 0;
  const inWindow = (f: Finding) => (f.end ?? to) >= from;
  for (const pad of pads) {
    const next = await series.next();
    const loaded = next.done ? [] : next.value;
    for (const [target, rep] of [[current, undefined], [candidate, replace]] as const) {
      const result = diagnoseLoadedPad(pad, loaded, (id) => index.forWell(pad.fieldId, id, rep).rules, index.forField(pad.fieldId, rep).rules);
      for (const w of result.wells) for (const f of w.findings) if (inWindow(f)) target.set(f.rule, (target.get(f.rule) ?? 0) + 1);
      events[rep ? "candidate" : "current"] += result.fieldEvents.filter((e) => e.end >= from).length;
      if (!rep) wellsWithData += result.wells.length;
    }
  }
  await series.return(undefined);
  return {
    days,
    from: new Date(from).toISOString(),
    to: new Date(to).toISOString(),
    wells: wellIds.length,
    wellsWithData,
    rules: RULE_KEYS.map((rule) => ({ rule, current: current.get(rule) ?? 0, candidate: candidate.get(rule) ?? 0 })),
    fieldEvents: events,
  };
}
