import { User, sequelize } from "@/models";
import { AppError, notFound } from "@/lib/errors";
import { parseOrThrow } from "@/lib/http";
import type { Actor } from "@/lib/auth/actor";
import { NotificationPreferencesSchema, type NotificationPreferences } from "@/lib/validations/issues";
import { writeAudit } from "@/lib/services/audit/write-audit";
import { readNotificationPreferences } from "./read-notification-preferences";

/** Anyone changes their own e-mail choices (stored under users.preferences.notifications). */
export async function saveNotificationPreferences(actor: Actor, input: unknown): Promise<NotificationPreferences> {
  if (!actor.userId) throw new AppError("forbidden", "Only a person has preferences");
  const data = parseOrThrow(NotificationPreferencesSchema, input);
  return sequelize.transaction(async (transaction) => {
    const u = await User.findOne({ where: { id: actor.userId!, organization_id: actor.organizationId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!u) throw notFound("Person not found");
    const before = readNotificationPreferences(u.preferences);
    await u.update({ preferences: { ...(u.preferences ?? {}), notifications: data } }, { transaction });
    await writeAudit(actor, { action: "user.notification_preferences", entityType: "user", entityId: u.id, before, after: data }, transaction);
    return data;
  });
}
