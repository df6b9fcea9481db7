import type { Transaction } from "sequelize";
import { AuditLog } from "@/models";
import type { Actor } from "@/lib/auth/actor";

/** Append one row to the audit log: who, what, when, before/after. */
export async function writeAudit(
  actor: Actor,
  entry: { action: string; entityType: string; entityId?: string | number | null; before?: unknown; after?: unknown },
  transaction?: Transaction,
): Promise<void> {
  await AuditLog.create(
    {
      organization_id: actor.organizationId,
      user_id: actor.userId,
      action: entry.action,
      entity_type: entry.entityType,
      entity_id: entry.entityId == null ? null : String(entry.entityId),
      before: entry.before ?? null,
      after: entry.after ?? null,
    },
    { transaction },
  );
}
