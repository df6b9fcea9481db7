import type { Actor } from "@/lib/auth/actor";
import { requireCapability } from "@/lib/auth/actor";
import { AppError, isAppError } from "@/lib/errors";
import { parseOrThrow } from "@/lib/http";
import { BulkTriageSchema } from "@/lib/validations/issues";
import { acknowledgeIssue } from "./acknowledge-issue";
import { assignIssue } from "./assign-issue";

export interface BulkItemResult {
  id: number;
  ok: boolean;
  status?: string;
  code?: string;
  message?: string;
}

/**
 * Acknowledge or assign several issues: each goes through the same service
 * (capability, organization, transition table) in its own transaction, and
 * the answer reports each id.
 */
export async function bulkTriage(actor: Actor, input: unknown): Promise<{ results: BulkItemResult[]; okCount: number }> {
  requireCapability(actor, "issues.triage");
  const data = parseOrThrow(BulkTriageSchema, input);
  if (data.kind === "assign" && !data.assigneeId) {
    throw new AppError("invalid", "Choose an operator", [{ path: "assigneeId", message: "required to assign" }]);
  }
  const results: BulkItemResult[] = [];
  for (const id of [...new Set(data.ids)]) {
    try {
      const r = data.kind === "acknowledge"
        ? await acknowledgeIssue(actor, id)
        : await assignIssue(actor, id, { assigneeId: data.assigneeId, priority: data.priority ?? "normal", dueOn: data.dueOn });
      results.push({ id, ok: true, status: r.status });
    } catch (e) {
      if (!isAppError(e)) throw e;
      results.push({ id, ok: false, code: e.code, message: e.message });
    }
  }
  return { results, okCount: results.filter((r) => r.ok).length };
}
