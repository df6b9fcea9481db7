// The wells a diagnosis covers, grouped by pad with their designs. Wells asked for
// by id bring their pad mates along (read, not diagnosed) so pad-wide outages can
// still be told apart from a problem of one well.
import { Op } from "sequelize";
import { Mandrel, Pad, Well } from "@/models";
import type { WellDesign } from "@/lib/gaslift/types";
import { toDesign, toMandrel } from "@/lib/services/wells/well-dto";

export interface DiagnosisWell {
  id: number;
  name: string;
  design: WellDesign;
}

export interface DiagnosisPad {
  padId: number;
  fieldId: number;
  wells: DiagnosisWell[];
  /** Wells whose findings are applied (the others only inform pad-wide events). */
  targetIds: Set<number>;
}

export async function loadDiagnosisPads(organizationId: number, scope: { wellIds?: number[]; fieldId?: number }): Promise<DiagnosisPad[]> {
  const padWhere: Record<string, unknown> = { organization_id: organizationId };
  if (scope.fieldId) padWhere.field_id = scope.fieldId;
  let targets: Set<number> | null = null;
  if (scope.wellIds?.length) {
    const asked = await Well.findAll({ where: { organization_id: organizationId, id: { [Op.in]: scope.wellIds } }, attributes: ["id", "pad_id"] });
    targets = new Set(asked.map((w) => w.id));
    padWhere.id = { [Op.in]: [...new Set(asked.map((w) => w.pad_id))] };
  }
  const pads = await Pad.findAll({ where: padWhere, attributes: ["id", "field_id"], order: [["field_id", "ASC"], ["name", "ASC"]] });
  if (!pads.length) return [];
  const wells = await Well.findAll({ where: { organization_id: organizationId, pad_id: { [Op.in]: pads.map((p) => p.id) } }, order: [["name", "ASC"]] });
  const mandrels = await Mandrel.findAll({ where: { organization_id: organizationId, well_id: { [Op.in]: wells.map((w) => w.id) } }, order: [["position", "ASC"]] });
  const mandrelsOf = new Map<number, Mandrel[]>();
  for (const m of mandrels) mandrelsOf.set(m.well_id, [...(mandrelsOf.get(m.well_id) ?? []), m]);
  return pads
    .map((p) => {
      const padWells = wells.filter((w) => w.pad_id === p.id);
      return {
        padId: p.id,
        fieldId: p.field_id,
        wells: padWells.map((w) => ({ id: w.id, name: w.name, design: toDesign(w, (mandrelsOf.get(w.id) ?? []).map(toMandrel)) })),
        targetIds: new Set(padWells.filter((w) => !targets || targets.has(w.id)).map((w) => w.id)),
      };
    })
    .filter((p) => p.targetIds.size > 0);
}
