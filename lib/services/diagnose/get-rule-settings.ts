// The rule settings of one level (organization, field or well) for the settings
// page: what is set at this level, what it inherits from the levels above, the
// effective values and the documented defaults.
import { RuleSetting, User } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { DEFAULT_SETTINGS, type RuleSettings } from "@/lib/diagnostics/settings";
import { DEFAULT_LIFECYCLE, type IssueLifecycle } from "./lifecycle-settings";
import { loadSettingsIndex, type EffectiveSettings } from "./load-settings-index";
import { readStoredOverride, type StoredRuleOverride } from "./rule-override";
import { resolveRuleScope, type RuleScope } from "./rule-scope";

export interface RuleSettingsView {
  scope: RuleScope;
  label: string;
  /** Numbers set at this level only. */
  override: StoredRuleOverride;
  /** What this level would get with nothing set here. */
  inherited: EffectiveSettings;
  effective: EffectiveSettings;
  defaults: { rules: RuleSettings; lifecycle: IssueLifecycle };
  updatedAt: string | null;
  updatedBy: string | null;
}

export async function getRuleSettings(actor: Actor, scopeInput: unknown): Promise<RuleSettingsView> {
  requireCapability(actor, "rules.edit");
  const resolved = await resolveRuleScope(actor, scopeInput);
  const index = await loadSettingsIndex(actor.organizationId);
  const row = await RuleSetting.findOne({ where: { organization_id: actor.organizationId, field_id: resolved.fieldId, well_id: resolved.wellId } });
  const override = row ? readStoredOverride(row.settings) : {};
  const level = resolved.scope.level;
  const empty = { level, id: resolved.fieldId ?? resolved.wellId ?? undefined, override: {} };
  const fieldId = resolved.parentFieldId ?? -1;
  const effectiveOf = (replace?: typeof empty) =>
    resolved.wellId ? index.forWell(fieldId, resolved.wellId, replace) : level === "field" ? index.forField(fieldId, replace) : index.forField(-1, replace);
  const by = row?.updated_by ? await User.findOne({ where: { id: row.updated_by, organization_id: actor.organizationId }, attributes: ["name"] }) : null;
  return {
    scope: resolved.scope,
    label: resolved.label,
    override,
    inherited: effectiveOf(empty),
    effective: effectiveOf(),
    defaults: { rules: DEFAULT_SETTINGS, lifecycle: DEFAULT_LIFECYCLE },
    updatedAt: row?.updated_at.toISOString() ?? null,
    updatedBy: by?.name ?? null,
  };
}
