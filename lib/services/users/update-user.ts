import { z } from "zod";
import { User } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { AppError, notFound } from "@/lib/errors";
import { parseOrThrow } from "@/lib/http";
import { writeAudit } from "@/lib/services/audit/write-audit";
import { ROLES } from "@/lib/auth/roles";

const UpdateSchema = z.object({ role: z.enum(ROLES).optional(), active: z.boolean().optional() });

/** Admin changes a person's role or switches the account off. */
export async function updateUser(actor: Actor, userId: number, input: unknown): Promise<void> {
  requireCapability(actor, "users.manage");
  const data = parseOrThrow(UpdateSchema, input);
  const user = await User.findOne({ where: { id: userId, organization_id: actor.organizationId } });
  if (!user) throw notFound("Person not found");
  if (user.id === actor.userId && (data.active === false || (data.role && data.role !== "admin"))) {
    throw new AppError("invalid", "You cannot remove your own administrator access");
  }
  const before = { role: user.role, active: user.active };
  await user.update(data);
  await writeAudit(actor, { action: "user.update", entityType: "user", entityId: user.id, before, after: data });
}

const PrefsSchema = z.object({ unitSystem: z.enum(["oilfield", "metric"]) });

/** Anyone changes their own display units. */
export async function updateOwnPreferences(actor: Actor, input: unknown): Promise<void> {
  if (!actor.userId) throw new AppError("forbidden", "Only a person has preferences");
  const data = parseOrThrow(PrefsSchema, input);
  await User.update({ unit_system: data.unitSystem }, { where: { id: actor.userId, organization_id: actor.organizationId } });
}
