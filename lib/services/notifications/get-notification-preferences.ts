import { User } from "@/models";
import { AppError, notFound } from "@/lib/errors";
import type { Actor } from "@/lib/auth/actor";
import type { NotificationPreferences } from "@/lib/validations/issues";
import { readNotificationPreferences } from "./read-notification-preferences";

/** The signed-in person's e-mail notification choices. */
export async function getNotificationPreferences(actor: Actor): Promise<NotificationPreferences> {
  if (!actor.userId) throw new AppError("forbidden", "Only a person has preferences");
  const u = await User.findOne({ where: { id: actor.userId, organization_id: actor.organizationId }, attributes: ["preferences"] });
  if (!u) throw notFound("Person not found");
  return readNotificationPreferences(u.preferences);
}
