// One in-app notification row; written in the same transaction as the change
// it announces so the bell never shows something that did not happen.
import type { Transaction } from "sequelize";
import { Notification } from "@/models";

export async function createNotification(
  n: { organizationId: number; userId: number; kind: string; title: string; body?: string; link?: string | null },
  transaction?: Transaction,
): Promise<void> {
  await Notification.create(
    { organization_id: n.organizationId, user_id: n.userId, kind: n.kind, title: n.title.slice(0, 200), body: n.body ?? "", link: n.link ?? null },
    { transaction },
  );
}
