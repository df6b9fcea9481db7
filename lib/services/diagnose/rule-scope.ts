// Where a set of rule settings applies: the whole organization, one field or one
// well. Resolved inside the actor's organization (another's field or well is 404).
import { z } from "zod";
import { Op } from "sequelize";
import { Field, Pad, Well } from "@/models";
import type { Actor } from "@/lib/auth/actor";
import { notFound } from "@/lib/errors";
import { parseOrThrow } from "@/lib/http";

export const RuleScopeSchema = z.discriminatedUnion("level", [
  z.object({ level: z.literal("organization") }),
  z.object({ level: z.literal("field"), fieldId: z.coerce.number().int().positive() }),
  z.object({ level: z.literal("well"), wellId: z.coerce.number().int().positive() }),
]);
export type RuleScope = z.infer<typeof RuleScopeSchema>;

export interface ResolvedScope {
  scope: RuleScope;
  label: string;
  /** The rule_settings row key of this level. */
  fieldId: number | null;
  wellId: number | null;
  /** For a well: the field it belongs to (its settings sit between the organization's and the well's). */
  parentFieldId: number | null;
}

export async function resolveRuleScope(actor: Actor, input: unknown): Promise<ResolvedScope> {
  const scope = parseOrThrow(RuleScopeSchema, input);
  const org = actor.organizationId;
  if (scope.level === "organization") return { scope, label: "Whole organization", fieldId: null, wellId: null, parentFieldId: null };
  if (scope.level === "field") {
    const f = await Field.findOne({ where: { id: scope.fieldId, organization_id: org } });
    if (!f) throw notFound("Field not found");
    return { scope, label: `Field ${f.name}`, fieldId: f.id, wellId: null, parentFieldId: f.id };
  }
  const w = await Well.findOne({ where: { id: scope.wellId, organization_id: org } });
  if (!w) throw notFound("Well not found");
  const pad = await Pad.findOne({ where: { id: w.pad_id, organization_id: org } });
  return { scope, label: `Well ${w.name}`, fieldId: null, wellId: w.id, parentFieldId: pad?.field_id ?? null };
}

/** The well ids a scope covers. */
export async function listScopeWellIds(organizationId: number, resolved: ResolvedScope): Promise<number[]> {
  if (resolved.wellId) return [resolved.wellId];
  const padWhere: Record<string, unknown> = { organization_id: organizationId };
  if (resolved.fieldId) padWhere.field_id = resolved.fieldId;
  const pads = await Pad.findAll({ where: padWhere, attributes: ["id"] });
  const wells = await Well.findAll({ where: { organization_id: organizationId, pad_id: { [Op.in]: pads.map((p) => p.id) } }, attributes: ["id"], order: [["id", "ASC"]] });
  return wells.map((w) => w.id);
}
