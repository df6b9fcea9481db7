import type { DiagnoseRun } from "@/models";

/** A diagnose_runs row as the UI polls it. */
export interface DiagnoseRunView {
  id: number;
  reason: string;
  status: "queued" | "running" | "done" | "failed";
  scope: { wellId?: number; fieldId?: number };
  wellsTotal: number;
  wellsDone: number;
  issuesOpened: number;
  issuesUpdated: number;
  error: string | null;
  createdAt: string;
  startedAt: string | null;
  finishedAt: string | null;
}

export function toDiagnoseRunView(r: DiagnoseRun): DiagnoseRunView {
  const scope = r.scope as { wellId?: number; fieldId?: number; wellIds?: number[] };
  return {
    id: r.id,
    reason: r.reason,
    status: r.status,
    scope: { wellId: scope.wellId ?? (scope.wellIds?.length === 1 ? scope.wellIds[0] : undefined), fieldId: scope.fieldId },
    wellsTotal: r.wells_total,
    wellsDone: r.wells_done,
    issuesOpened: r.issues_opened,
    issuesUpdated: r.issues_updated,
    error: r.error,
    createdAt: r.created_at.toISOString(),
    startedAt: r.started_at?.toISOString() ?? null,
    finishedAt: r.finished_at?.toISOString() ?? null,
  };
}
