import { UniqueConstraintError } from "sequelize";
import { Field, Pad } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { AppError } from "@/lib/errors";
import { FieldSchema, PadSchema } from "@/lib/validations/well";
import { parseOrThrow } from "@/lib/http";
import { writeAudit } from "@/lib/services/audit/write-audit";

export async function createField(actor: Actor, input: unknown): Promise<number> {
  requireCapability(actor, "wells.edit");
  const d = parseOrThrow(FieldSchema, input);
  try {
    const f = await Field.create({ organization_id: actor.organizationId, name: d.name, time_zone: d.timeZone });
    await writeAudit(actor, { action: "field.create", entityType: "field", entityId: f.id, after: d });
    return f.id;
  } catch (e) {
    if (e instanceof UniqueConstraintError) throw new AppError("conflict", "A field with this name exists", [{ path: "name", message: "Name in use" }]);
    throw e;
  }
}

export async function createPad(actor: Actor, input: unknown): Promise<number> {
  requireCapability(actor, "wells.edit");
  const d = parseOrThrow(PadSchema, input);
  const field = await Field.findOne({ where: { id: d.fieldId, organization_id: actor.organizationId } });
  if (!field) throw new AppError("invalid", "Choose a field of your organization", [{ path: "fieldId", message: "Unknown field" }]);
  try {
    const p = await Pad.create({ organization_id: actor.organizationId, field_id: field.id, name: d.name });
    await writeAudit(actor, { action: "pad.create", entityType: "pad", entityId: p.id, after: d });
    return p.id;
  } catch (e) {
    if (e instanceof UniqueConstraintError) throw new AppError("conflict", "A pad with this name exists in the field", [{ path: "name", message: "Name in use" }]);
    throw e;
  }
}
