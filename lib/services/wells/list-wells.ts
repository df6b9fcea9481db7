import { Op, type Order, type WhereOptions } from "sequelize";
import { Field, Pad, Well, sequelize } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { WellFilterSchema } from "@/lib/validations/well";
import { parseOrThrow } from "@/lib/http";
import type { WellSummary } from "./well-dto";

/** The register: the actor's organization only, filtered and sorted on the server. */
export async function listWells(actor: Actor, rawFilter: unknown): Promise<WellSummary[]> {
  requireCapability(actor, "wells.read");
  const f = parseOrThrow(WellFilterSchema, rawFilter ?? {});
  const where: WhereOptions = { organization_id: actor.organizationId };
  if (f.status) Object.assign(where, { status: f.status });
  if (f.padId) Object.assign(where, { pad_id: f.padId });
  if (f.q) Object.assign(where, { [Op.or]: [{ name: { [Op.iLike]: `%${f.q}%` } }, { uwi: { [Op.iLike]: `%${f.q}%` } }] });
  const padWhere: WhereOptions = f.fieldId ? { field_id: f.fieldId } : {};
  const dir = f.dir === "desc" ? "DESC" : "ASC";
  const order: Order =
    f.sort === "field" ? [[{ model: Pad, as: "pad" }, { model: Field, as: "field" }, "name", dir], ["name", "ASC"]]
    : f.sort === "pad" ? [[{ model: Pad, as: "pad" }, "name", dir], ["name", "ASC"]]
    : f.sort === "updated" ? [["updated_at", dir]]
    : [[f.sort, dir]];

  const rows = await Well.findAll({
    where,
    include: [{ model: Pad, as: "pad", where: padWhere, include: [{ model: Field, as: "field" }] }],
    attributes: { include: [[sequelize.literal(`(SELECT count(*) FROM mandrels m WHERE m.well_id = "Well"."id")`), "mandrel_count"]] },
    order,
  });
  return rows.map((w) => {
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
      mandrelCount: Number(w.get("mandrel_count")),
      updatedAt: w.updated_at.toISOString(),
    };
  });
}
