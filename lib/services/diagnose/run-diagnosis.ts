// One diagnosis (called by the worker, the demo seed and the benchmark): pad by pad,
// load the aligned series with a look-back before `from`, merge each well's settings
// (organization → field → well), run the rules, upsert pad-wide field events and
// apply each well's findings to its issues. Progress goes to the diagnose_runs row
// and to the caller. Safe to run twice: everything it writes is an idempotent upsert.
//
// Time range: `to` defaults to the newest stored value of the wells (data time, not
// the clock), `from` to `to` minus 30 days for a manual run and 2 days otherwise.
// Look-back: lookback.ts (at least 3 days, from the start of that UTC day).
import type pg from "pg";
import { DiagnoseRun } from "@/models";
import type { RuleSettings } from "@/lib/diagnostics/settings";
import { loadAlignedSeries } from "@/lib/services/samples/load-aligned-series";
import { applyFindings } from "./apply-findings";
import { diagnoseLoadedPad } from "./diagnose-loaded-pad";
import { DiagnoseRunJobSchema, type DiagnoseRunJob } from "./diagnose-run-job";
import { findLatestSampleTime } from "./latest-sample-time";
import { loadDiagnosisPads } from "./load-diagnosis-pads";
import { loadSettingsIndex } from "./load-settings-index";
import { dataStart, lookbackMs } from "./lookback";
import { upsertFieldEvents } from "./upsert-field-events";

const DAY_MS = 86_400_000;
export const MANUAL_DAYS = 30;
export const DEFAULT_DAYS = 2;

export interface DiagnosisProgress {
  wellsDone: number;
  wellsTotal: number;
}

export interface RunDiagnosisOptions {
  /** Keep a diagnose_runs row (default true). The demo seed runs without one. */
  isRecorded?: boolean;
  /** The queue job's id: a retried job finds the run row of its earlier attempt. */
  jobId?: string;
  /** Read samples on this connection instead of the shared pool (scripts that must exit promptly). */
  client?: pg.ClientBase;
}

export interface DiagnosisSummary {
  runId: number | null;
  wellsTotal: number;
  wellsDone: number;
  wellsWithData: number;
  issuesOpened: number;
  issuesUpdated: number;
  recurred: number;
  verified: number;
  fieldEventsCreated: number;
  from: number | null;
  to: number | null;
  lookbackMs: number;
  valueCount: number;
  /** Milliseconds spent reading series, in the rules, and writing issues. */
  loadMs: number;
  rulesMs: number;
  applyMs: number;
}

export async function runDiagnosis(
  input: DiagnoseRunJob,
  onProgress?: (p: DiagnosisProgress) => void | Promise<void>,
  options: RunDiagnosisOptions = {},
): Promise<DiagnosisSummary> {
  const job = DiagnoseRunJobSchema.parse(input);
  const orgId = job.organizationId;
  const run = options.isRecorded === false ? null : await findOrCreateRun(job, options.jobId);
  const summary: DiagnosisSummary = {
    runId: run?.id ?? null, wellsTotal: 0, wellsDone: 0, wellsWithData: 0, issuesOpened: 0, issuesUpdated: 0, recurred: 0, verified: 0,
    fieldEventsCreated: 0, from: null, to: null, lookbackMs: 0, valueCount: 0, loadMs: 0, rulesMs: 0, applyMs: 0,
  };
  try {
    const pads = await loadDiagnosisPads(orgId, { wellIds: job.wellIds, fieldId: job.fieldId });
    summary.wellsTotal = pads.reduce((n, p) => n + p.targetIds.size, 0);
    await run?.update({ status: "running", started_at: new Date(), finished_at: null, error: null, wells_total: summary.wellsTotal, wells_done: 0 });
    const settings = await loadSettingsIndex(orgId);
    const wellRules = new Map<number, RuleSettings>();
    const lifecycles = new Map<number, ReturnType<typeof settings.forWell>["lifecycle"]>();
    for (const p of pads) {
      for (const w of p.wells) {
        const eff = settings.forWell(p.fieldId, w.id);
        wellRules.set(w.id, eff.rules);
        lifecycles.set(w.id, eff.lifecycle);
      }
    }
    const targetIds = pads.flatMap((p) => [...p.targetIds]);
    const to = job.to ?? (await findLatestSampleTime(targetIds)) ?? Date.now();
    const from = job.from ?? to - (job.reason === "manual" ? MANUAL_DAYS : DEFAULT_DAYS) * DAY_MS;
    summary.lookbackMs = lookbackMs([...wellRules.values()]);
    summary.from = from;
    summary.to = to;
    // `to` is inclusive: the newest value itself belongs to the run.
    const series = loadAlignedSeries(orgId, pads.map((p) => p.wells.map((w) => w.id)), dataStart(from, summary.lookbackMs), to + 1, { client: options.client });
    let t = performance.now();
    for (const pad of pads) {
      const next = await series.next();
      const loaded = next.done ? [] : next.value;
      summary.loadMs += performance.now() - t;
      summary.valueCount += loaded.reduce((n, l) => n + l.valueCount, 0);

      t = performance.now();
      const result = diagnoseLoadedPad(pad, loaded, (id) => wellRules.get(id)!, settings.forField(pad.fieldId).rules);
      summary.rulesMs += performance.now() - t;

      t = performance.now();
      const padLastT = Math.max(...loaded.map((l) => l.lastT ?? -Infinity));
      if (Number.isFinite(padLastT)) {
        const fe = await upsertFieldEvents(orgId, pad.padId, pad.wells.length, result.fieldEvents, padLastT);
        summary.fieldEventsCreated += fe.created;
      }
      for (const w of result.wells) {
        const c = await applyFindings(orgId, w.wellId, w.findings, w.lastT, { lifecycle: lifecycles.get(w.wellId), judgedFrom: from });
        summary.issuesOpened += c.opened;
        summary.issuesUpdated += c.updated;
        summary.recurred += c.recurred;
        summary.verified += c.verified;
      }
      summary.wellsWithData += result.wells.length;
      summary.wellsDone += pad.targetIds.size;
      await run?.update({ wells_done: summary.wellsDone, issues_opened: summary.issuesOpened, issues_updated: summary.issuesUpdated });
      await onProgress?.({ wellsDone: summary.wellsDone, wellsTotal: summary.wellsTotal });
      summary.applyMs += performance.now() - t;
      t = performance.now();
    }
    await series.return(undefined);
    await run?.update({ status: "done", finished_at: new Date(), wells_done: summary.wellsDone });
    return summary;
  } catch (e) {
    await run?.update({ status: "failed", finished_at: new Date(), error: e instanceof Error ? e.message.slice(0, 2000) : String(e) }).catch(() => undefined);
    throw e;
  }
}

async function findOrCreateRun(job: DiagnoseRunJob, jobId?: string): Promise<DiagnoseRun> {
  if (job.runId) {
    const existing = await DiagnoseRun.findOne({ where: { id: job.runId, organization_id: job.organizationId } });
    if (existing) return existing;
  }
  if (jobId) {
    const existing = await DiagnoseRun.findOne({ where: { organization_id: job.organizationId, scope: { jobId } } });
    if (existing) return existing;
  }
  const scope: Record<string, unknown> = {};
  if (job.wellIds) scope.wellIds = job.wellIds;
  if (job.fieldId) scope.fieldId = job.fieldId;
  if (jobId) scope.jobId = jobId;
  return DiagnoseRun.create({ organization_id: job.organizationId, requested_by: job.requestedBy ?? null, reason: job.reason, scope, status: "queued" });
}
