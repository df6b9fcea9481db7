import { Op } from "sequelize";
import { z } from "zod";
import { Notification } from "@/models";
import { AppError } from "@/lib/errors";
import { parseOrThrow } from "@/lib/http";
import type { Actor } from "@/lib/auth/actor";

const MarkReadSchema = z.object({ ids: z.array(z.number().int().positive()).max(500).optional(), all: z.boolean().optional() });

/** Marks the given (or all) of the person's own notifications read; returns how many changed. */
export async function markNotificationsRead(actor: Actor, input: unknown): Promise<{ updated: number }> {
  if (!actor.userId) throw new AppError("forbidden", "Only a person has notifications");
  const data = parseOrThrow(MarkReadSchema, input);
  if (!data.all && !data.ids?.length) throw new AppError("invalid", "Give ids or all: true");
  const where = {
    user_id: actor.userId,
    organization_id: actor.organizationId,
    read_at: { [Op.is]: null },
    ...(data.all ? {} : { id: { [Op.in]: data.ids! } }),
  };
  const [updated] = await Notification.update({ read_at: new Date() }, { where });
  return { updated };
}
