// Every change to an issue leaves two traces: an issue_events row (the
// history shown on the issue page, with from/to status) and an audit_logs row.
import type { Transaction } from "sequelize";
import { IssueEvent, type Issue } from "@/models";
import type { Actor } from "@/lib/auth/actor";
import { writeAudit } from "@/lib/services/audit/write-audit";

export async function recordIssueChange(
  actor: Actor,
  issue: Issue,
  change: { kind: string; from: string | null; to: string | null; data?: Record<string, unknown>; before?: unknown; after?: unknown },
  transaction?: Transaction,
): Promise<void> {
  await IssueEvent.create(
    {
      organization_id: issue.organization_id,
      issue_id: issue.id,
      user_id: actor.userId,
      kind: change.kind,
      from_status: change.from,
      to_status: change.to,
      data: change.data ?? {},
    },
    { transaction },
  );
  await writeAudit(
    actor,
    {
      action: `issue.${change.kind}`,
      entityType: "issue",
      entityId: issue.id,
      before: change.before ?? { status: change.from },
      after: change.after ?? { status: change.to, ...(change.data ?? {}) },
    },
    transaction,
  );
}
