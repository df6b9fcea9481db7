// A person's e-mail choices from users.preferences, with defaults filled in.
import { DEFAULT_NOTIFICATION_PREFERENCES, NotificationPreferencesSchema, type NotificationPreferences } from "@/lib/validations/issues";

export function readNotificationPreferences(preferences: unknown): NotificationPreferences {
  const raw = (preferences as { notifications?: unknown } | null)?.notifications;
  const email = { ...DEFAULT_NOTIFICATION_PREFERENCES.email, ...((raw as { email?: object } | undefined)?.email ?? {}) };
  const r = NotificationPreferencesSchema.safeParse({ email });
  return r.success ? r.data : DEFAULT_NOTIFICATION_PREFERENCES;
}
