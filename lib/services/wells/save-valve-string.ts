import { Mandrel, Well, sequelize } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { notFound } from "@/lib/errors";
import { ValveStringSchema } from "@/lib/validations/well";
import { parseOrThrow } from "@/lib/http";
import { writeAudit } from "@/lib/services/audit/write-audit";
import { mandrelColumns, toMandrel } from "./well-dto";

/** Replace a well's whole valve string (top to bottom) in one transaction. */
export async function saveValveString(actor: Actor, wellId: number, input: unknown): Promise<void> {
  requireCapability(actor, "wells.edit");
  const list = parseOrThrow(ValveStringSchema, input);
  await sequelize.transaction(async (transaction) => {
    const w = await Well.findOne({ where: { id: wellId, organization_id: actor.organizationId }, transaction, lock: true });
    if (!w) throw notFound("Well not found");
    const before = (await Mandrel.findAll({ where: { well_id: w.id }, order: [["position", "ASC"]], transaction })).map(toMandrel);
    await Mandrel.destroy({ where: { well_id: w.id, organization_id: actor.organizationId }, transaction });
    const rows = list.map((m) => ({ ...mandrelColumns(m), well_id: w.id, organization_id: actor.organizationId }));
    await Mandrel.bulkCreate(rows, { transaction });
    await w.changed("updated_at", true);
    await w.save({ transaction });
    await writeAudit(actor, { action: "well.valves.replace", entityType: "well", entityId: w.id, before, after: list }, transaction);
  });
}
