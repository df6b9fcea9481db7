import { Field, Pad } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";

export interface FieldNode {
  id: number;
  name: string;
  timeZone: string;
  pads: { id: number; name: string }[];
}

/** Fields and their pads for pickers and filters. */
export async function listFieldTree(actor: Actor): Promise<FieldNode[]> {
  requireCapability(actor, "wells.read");
  const fields = await Field.findAll({
    where: { organization_id: actor.organizationId },
    include: [{ model: Pad, as: "pads" }],
    order: [["name", "ASC"], [{ model: Pad, as: "pads" }, "name", "ASC"]],
  });
  return fields.map((f) => ({
    id: f.id,
    name: f.name,
    timeZone: f.time_zone,
    pads: ((f as unknown as { pads: Pad[] }).pads ?? []).map((p) => ({ id: p.id, name: p.name })),
  }));
}
