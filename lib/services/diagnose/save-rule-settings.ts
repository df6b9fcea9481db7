// Save the numbers set at one level (organization, field or well). Validated with
// the engine's RuleSettingsSchema (and the lifecycle schema); an empty set removes
// the level's row so it inherits everything. Audit-logged with before and after.
import { RuleSetting, sequelize } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { AppError } from "@/lib/errors";
import { writeAudit } from "@/lib/services/audit/write-audit";
import { parseRuleOverride, readStoredOverride, type StoredRuleOverride } from "./rule-override";
import { resolveRuleScope } from "./rule-scope";

export async function saveRuleSettings(actor: Actor, scopeInput: unknown, settingsInput: unknown): Promise<StoredRuleOverride> {
  requireCapability(actor, "rules.edit");
  const resolved = await resolveRuleScope(actor, scopeInput);
  const parsed = parseRuleOverride(settingsInput);
  if (!parsed.ok) throw new AppError("invalid", "Some settings are not valid", parsed.issues);
  const value = parsed.value;
  const isEmpty = Object.keys(value).length === 0;
  return sequelize.transaction(async (transaction) => {
    const where = { organization_id: actor.organizationId, field_id: resolved.fieldId, well_id: resolved.wellId };
    const row = await RuleSetting.findOne({ where, transaction, lock: transaction.LOCK.UPDATE });
    const before = row ? readStoredOverride(row.settings) : null;
    let id: number | null = row?.id ?? null;
    if (isEmpty) {
      await row?.destroy({ transaction });
    } else if (row) {
      await row.update({ settings: value as Record<string, unknown>, updated_by: actor.userId }, { transaction });
    } else {
      const created = await RuleSetting.create({ ...where, settings: value as Record<string, unknown>, updated_by: actor.userId }, { transaction });
      id = created.id;
    }
    await writeAudit(actor, { action: "rule_settings.save", entityType: "rule_settings", entityId: id, before: { scope: resolved.scope, settings: before }, after: { scope: resolved.scope, settings: isEmpty ? null : value } }, transaction);
    return value;
  });
}
