import { Organization, sequelize } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { notFound } from "@/lib/errors";
import { parseOrThrow } from "@/lib/http";
import { ResolutionActionsSchema } from "@/lib/validations/issues";
import { writeAudit } from "@/lib/services/audit/write-audit";

/** Admins and engineers edit the organization's list of resolution actions. */
export async function saveResolutionActions(actor: Actor, input: unknown): Promise<string[]> {
  requireCapability(actor, "issues.triage");
  const list = parseOrThrow(ResolutionActionsSchema, input);
  return sequelize.transaction(async (transaction) => {
    const org = await Organization.findByPk(actor.organizationId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!org) throw notFound();
    const before = (org.settings as { resolutionActions?: unknown }).resolutionActions ?? null;
    await org.update({ settings: { ...org.settings, resolutionActions: list } }, { transaction });
    await writeAudit(actor, { action: "org.resolution_actions", entityType: "organization", entityId: org.id, before, after: list }, transaction);
    return list;
  });
}
