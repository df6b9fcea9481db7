// Every rule_settings row of one organization, read once per diagnosis, and the
// cascade organization → field → well resolved per well (mergeSettings).
import { RuleSetting } from "@/models";
import { mergeSettings, type RuleSettings } from "@/lib/diagnostics/settings";
import { mergeLifecycle, type IssueLifecycle } from "./lifecycle-settings";
import { readStoredOverride, type StoredRuleOverride } from "./rule-override";

export interface EffectiveSettings {
  rules: RuleSettings;
  lifecycle: IssueLifecycle;
}

export interface SettingsIndex {
  org: StoredRuleOverride | null;
  fields: Map<number, StoredRuleOverride>;
  wells: Map<number, StoredRuleOverride>;
  /** Effective settings of a well; `replace` swaps one level for a candidate (preview). */
  forWell(fieldId: number, wellId: number, replace?: ReplaceLevel): EffectiveSettings;
  forField(fieldId: number, replace?: ReplaceLevel): EffectiveSettings;
}

export interface ReplaceLevel {
  level: "organization" | "field" | "well";
  id?: number;
  override: StoredRuleOverride;
}

export async function loadSettingsIndex(organizationId: number): Promise<SettingsIndex> {
  const rows = await RuleSetting.findAll({ where: { organization_id: organizationId } });
  let org: StoredRuleOverride | null = null;
  const fields = new Map<number, StoredRuleOverride>();
  const wells = new Map<number, StoredRuleOverride>();
  for (const r of rows) {
    const o = readStoredOverride(r.settings);
    if (r.well_id) wells.set(r.well_id, o);
    else if (r.field_id) fields.set(r.field_id, o);
    else org = o;
  }
  const pick = (level: ReplaceLevel["level"], id: number | undefined, current: StoredRuleOverride | null | undefined, replace?: ReplaceLevel) =>
    replace && replace.level === level && (level === "organization" || replace.id === id) ? replace.override : current ?? null;
  const merge = ([a, b, c]: (StoredRuleOverride | null)[]): EffectiveSettings => ({
    rules: mergeSettings(withoutLifecycle(a), withoutLifecycle(b), withoutLifecycle(c)),
    lifecycle: mergeLifecycle(a?.lifecycle, b?.lifecycle, c?.lifecycle),
  });
  return {
    org,
    fields,
    wells,
    forWell: (fieldId, wellId, replace) =>
      merge([pick("organization", undefined, org, replace), pick("field", fieldId, fields.get(fieldId), replace), pick("well", wellId, wells.get(wellId), replace)]),
    forField: (fieldId, replace) => merge([pick("organization", undefined, org, replace), pick("field", fieldId, fields.get(fieldId), replace), null]),
  };
}

function withoutLifecycle(o: StoredRuleOverride | null): Omit<StoredRuleOverride, "lifecycle"> | null {
  if (!o) return null;
  const rules: Omit<StoredRuleOverride, "lifecycle"> & { lifecycle?: unknown } = { ...o };
  delete rules.lifecycle;
  return rules;
}
