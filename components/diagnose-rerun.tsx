"use client";
// Re-run the diagnosis of a field or a well and follow it: the run row is polled
// through /api/diagnose-runs/<id> every second until it is done or failed.
import { useState, useTransition } from "react";
import { useQuery } from "@tanstack/react-query";
import { UploadProgressBar } from "@/components/upload-progress-bar";
import type { DiagnoseRunView } from "@/lib/services/diagnose/diagnose-run-view";
import { requestDiagnosisAction } from "@/app/(app)/rules/actions";

type Target = { level: "organization" } | { level: "field"; fieldId: number } | { level: "well"; wellId: number };

async function fetchRun(id: number): Promise<DiagnoseRunView> {
  const r = await fetch(`/api/diagnose-runs/${id}`, { cache: "no-store" });
  if (!r.ok) throw new Error(`The run could not be read (${r.status})`);
  return r.json();
}

export function DiagnoseRerun({ fields, wells, initial }: { fields: { id: number; name: string }[]; wells: { id: number; name: string; fieldId: number }[]; initial: Target }) {
  const first = initial.level === "field" ? `field:${initial.fieldId}` : initial.level === "well" ? `well:${initial.wellId}` : fields[0] ? `field:${fields[0].id}` : "";
  const [target, setTarget] = useState(first);
  const [runId, setRunId] = useState<number | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [isPending, startTransition] = useTransition();
  const { data: run } = useQuery({
    queryKey: ["diagnose-run", runId],
    queryFn: () => fetchRun(runId as number),
    enabled: runId !== null,
    refetchInterval: (q) => (q.state.data && (q.state.data.status === "done" || q.state.data.status === "failed") ? false : 1000),
  });

  function start() {
    const [kind, id] = target.split(":");
    setError(null);
    startTransition(async () => {
      const r = await requestDiagnosisAction(kind === "well" ? { wellId: Number(id) } : { fieldId: Number(id) });
      if (r.ok) setRunId(r.data.id);
      else setError(r.message);
    });
  }

  const isActive = run && (run.status === "queued" || run.status === "running");
  const fraction = run && run.wellsTotal > 0 ? run.wellsDone / run.wellsTotal : 0;
  return (
    <div className="space-y-2">
      <div className="flex flex-wrap items-end gap-2">
        <label className="block min-w-64">
          <span className="field-label">Diagnose again (last 30 days of data)</span>
          <select className="field-input" value={target} onChange={(e) => setTarget(e.target.value)} data-testid="rerun-target">
            {fields.map((f) => (
              <optgroup key={f.id} label={f.name}>
                <option value={`field:${f.id}`}>Field: {f.name}</option>
                {wells.filter((w) => w.fieldId === f.id).map((w) => <option key={w.id} value={`well:${w.id}`}>Well: {w.name}</option>)}
              </optgroup>
            ))}
          </select>
        </label>
        <button type="button" className="rounded border border-line px-3 py-1.5 text-sm hover:bg-paper-sunk disabled:opacity-50" onClick={start} disabled={!target || isPending || !!isActive}>
          Re-run diagnostics
        </button>
      </div>
      {error && <p role="alert" className="text-sm text-bad">{error}</p>}
      {run && (
        <div className="max-w-md space-y-1" data-testid="rerun-progress">
          <UploadProgressBar value={run.status === "done" ? 1 : fraction} label="Diagnosis progress" tone={run.status === "failed" ? "bad" : run.status === "done" ? "good" : "copper"} />
          <p className="text-xs text-ink-soft">
            {run.status === "queued" && "Waiting for a worker…"}
            {run.status === "running" && `${run.wellsDone} of ${run.wellsTotal} wells diagnosed`}
            {run.status === "done" && `Done: ${run.wellsDone} wells, ${run.issuesOpened} issues opened, ${run.issuesUpdated} updated.`}
            {run.status === "failed" && `Failed: ${run.error ?? "unknown error"}`}
          </p>
        </div>
      )}
    </div>
  );
}
