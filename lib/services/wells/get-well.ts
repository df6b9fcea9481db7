import { Field, Mandrel, Pad, Well } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { notFound } from "@/lib/errors";
import { toDesign, toMandrel, type WellDetail } from "./well-dto";

/** One well of the actor's organization with its valve string; 404 otherwise. */
export async function getWell(actor: Actor, wellId: number): Promise<WellDetail> {
  requireCapability(actor, "wells.read");
  if (!Number.isInteger(wellId) || wellId <= 0) throw notFound("Well not found");
  const w = await Well.findOne({
    where: { id: wellId, organization_id: actor.organizationId },
    include: [{ model: Pad, as: "pad", include: [{ model: Field, as: "field" }] }],
  });
  if (!w) throw notFound("Well not found");
  const rows = await Mandrel.findAll({ where: { well_id: w.id, organization_id: actor.organizationId }, order: [["position", "ASC"]] });
  const mandrels = rows.map(toMandrel);
  const pad = (w as unknown as { pad: Pad & { field: Field } }).pad;
  return {
    id: w.id,
    name: w.name,
    uwi: w.uwi,
    status: w.status,
    padId: pad.id,
    padName: pad.name,
    fieldId: pad.field.id,
    fieldName: pad.field.name,
    timeZone: w.time_zone,
    mandrelCount: mandrels.length,
    updatedAt: w.updated_at.toISOString(),
    design: toDesign(w, mandrels),
    mandrels,
  };
}
