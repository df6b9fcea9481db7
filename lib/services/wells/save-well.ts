import { UniqueConstraintError } from "sequelize";
import { Pad, Well, sequelize } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { AppError, notFound } from "@/lib/errors";
import { WellSchema } from "@/lib/validations/well";
import { parseOrThrow } from "@/lib/http";
import { writeAudit } from "@/lib/services/audit/write-audit";
import { wellColumns } from "./well-dto";

/** Create (no id) or update a well of the actor's organization. Returns its id. */
export async function saveWell(actor: Actor, input: unknown, wellId?: number): Promise<number> {
  requireCapability(actor, "wells.edit");
  const data = parseOrThrow(WellSchema, input);
  const pad = await Pad.findOne({ where: { id: data.padId, organization_id: actor.organizationId } });
  if (!pad) throw new AppError("invalid", "Some values are not valid", [{ path: "padId", message: "Choose a pad of your organization" }]);
  const cols = wellColumns(data);
  try {
    return await sequelize.transaction(async (transaction) => {
      if (wellId === undefined) {
        const w = await Well.create({ ...cols, organization_id: actor.organizationId }, { transaction });
        await writeAudit(actor, { action: "well.create", entityType: "well", entityId: w.id, after: cols }, transaction);
        return w.id;
      }
      const w = await Well.findOne({ where: { id: wellId, organization_id: actor.organizationId }, transaction });
      if (!w) throw notFound("Well not found");
      const before = wellColumns({
        name: w.name, uwi: w.uwi, padId: w.pad_id, status: w.status, timeZone: w.time_zone,
        tubingIdIn: w.tubing_id_in, tubingDepthFt: w.tubing_depth_ft, perfDepthFt: w.perf_depth_ft,
        surfaceTempF: w.surface_temp_f, bottomholeTempF: w.bottomhole_temp_f, gasSg: w.gas_sg,
        liquidType: w.liquid_type, liquidGravity: w.liquid_gravity, waterCut: w.water_cut,
        reservoirPressurePsig: w.reservoir_pressure_psig, injectionPressurePsig: w.injection_pressure_psig,
      });
      await w.update(cols, { transaction });
      await writeAudit(actor, { action: "well.update", entityType: "well", entityId: w.id, before, after: cols }, transaction);
      return w.id;
    });
  } catch (e) {
    if (e instanceof UniqueConstraintError) {
      throw new AppError("conflict", "Another well already uses this identifier", [{ path: "uwi", message: "This identifier is already in use" }]);
    }
    throw e;
  }
}
