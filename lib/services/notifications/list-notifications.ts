import { Op } from "sequelize";
import { Notification } from "@/models";
import { AppError } from "@/lib/errors";
import type { Actor } from "@/lib/auth/actor";

export interface NotificationView {
  id: number;
  kind: string;
  title: string;
  body: string;
  link: string | null;
  createdAt: string;
  isRead: boolean;
}

/** The person's latest notifications and how many are unread (the bell polls this). */
export async function listNotifications(actor: Actor, limit = 20): Promise<{ unread: number; items: NotificationView[] }> {
  if (!actor.userId) throw new AppError("forbidden", "Only a person has notifications");
  const where = { user_id: actor.userId, organization_id: actor.organizationId };
  const [unread, rows] = await Promise.all([
    Notification.count({ where: { ...where, read_at: { [Op.is]: null } } }),
    Notification.findAll({ where, order: [["created_at", "DESC"], ["id", "DESC"]], limit: Math.min(Math.max(limit, 1), 100) }),
  ]);
  return {
    unread,
    items: rows.map((n) => ({
      id: Number(n.id),
      kind: n.kind,
      title: n.title,
      body: n.body,
      link: n.link,
      createdAt: n.created_at.toISOString(),
      isRead: n.read_at !== null,
    })),
  };
}
