"use client";
// The organization's uploads, newest first. While any upload is queued or
// being processed the list is fetched again every 1.5 s, so the bars move
// with the worker; once everything has settled the polling stops.
import Link from "next/link";
import { useQuery } from "@tanstack/react-query";
import { UploadProgressBar } from "@/components/upload-progress-bar";
import { formatBytes, formatWhen } from "@/components/upload-format";
import { isUploadMoving, UPLOAD_STATUS_LABEL, type UploadJson, type WellNames } from "@/components/upload-types";
import { UploadCountsCell, UploadRejectedCell, UploadSpansCell } from "./upload-counts";

const POLL_MS = 1_500;

async function fetchUploads(): Promise<UploadJson[]> {
  const res = await fetch("/api/uploads?limit=50", { cache: "no-store" });
  const body: unknown = await res.json().catch(() => null);
  if (!res.ok) {
    const msg = (body as { error?: { message?: string } } | null)?.error?.message;
    throw new Error(msg ?? `Could not load uploads (HTTP ${res.status})`);
  }
  // The list may come bare or wrapped with a total.
  if (Array.isArray(body)) return body as UploadJson[];
  const wrapped = body as { uploads?: UploadJson[]; items?: UploadJson[] } | null;
  return wrapped?.uploads ?? wrapped?.items ?? [];
}

export function UploadHistory({ canCreate, wellNames }: { canCreate: boolean; wellNames: WellNames }) {
  const q = useQuery({
    queryKey: ["uploads"],
    queryFn: fetchUploads,
    refetchInterval: (query) => (query.state.data?.some((u) => isUploadMoving(u.status)) ? POLL_MS : false),
    refetchIntervalInBackground: false,
  });

  return (
    <section aria-labelledby="history-heading" className="space-y-2">
      <h2 id="history-heading" className="text-sm font-semibold uppercase tracking-wide text-ink-soft">History</h2>
      {q.isError && <p className="text-sm text-bad" role="alert">{(q.error as Error).message}</p>}
      <div className="overflow-x-auto rounded border border-line bg-paper-raised">
        {/* On a phone the table scrolls sideways rather than squeezing names into slivers. */}
        <table className="data-table w-full min-w-[52rem]" data-testid="upload-history">
          <caption className="sr-only">Upload history</caption>
          <thead>
            <tr>
              <th scope="col">File</th>
              <th scope="col">From</th>
              <th scope="col">When</th>
              <th scope="col" className="min-w-36">Status</th>
              <th scope="col">Counts</th>
              <th scope="col">Refused</th>
              <th scope="col">Time span per well</th>
            </tr>
          </thead>
          <tbody>
            {q.isPending && (
              <tr><td colSpan={7} className="text-ink-soft">Loading…</td></tr>
            )}
            {q.data?.length === 0 && (
              <tr><td colSpan={7} className="text-ink-soft">No uploads yet.</td></tr>
            )}
            {q.data?.map((u) => <UploadRow key={u.id} upload={u} canCreate={canCreate} wellNames={wellNames} />)}
          </tbody>
        </table>
      </div>
    </section>
  );
}

function UploadRow({ upload: u, canCreate, wellNames }: { upload: UploadJson; canCreate: boolean; wellNames: WellNames }) {
  const status = UPLOAD_STATUS_LABEL[u.status] ?? u.status;
  const progress = u.status === "done" ? 1 : (u.progress ?? 0);
  const tone = u.status === "failed" || u.status === "refused" ? "bad" : u.status === "done" ? "good" : "copper";
  return (
    <tr data-testid="upload-row" data-upload-id={u.id} data-status={u.status}>
      <td className="min-w-40 max-w-56">
        <div className="break-words font-medium">{u.fileName}</div>
        <div className="text-xs text-ink-soft">{formatBytes(u.byteSize)}</div>
      </td>
      <td className="whitespace-nowrap">
        <div>{u.source === "api" ? "API" : "Browser"}</div>
        <div className="text-xs text-ink-soft">{u.uploadedBy ?? (u.source === "api" ? "API key" : "—")}</div>
      </td>
      <td className="whitespace-nowrap text-ink-soft">{formatWhen(u.createdAt)}</td>
      <td>
        <div className="mb-1 flex items-center gap-2">
          <span data-testid="upload-status" className={u.status === "done" ? "text-good" : u.status === "failed" || u.status === "refused" ? "text-bad" : ""}>
            {status}
          </span>
          {u.status === "processing" && <span className="text-xs tabular-nums text-ink-soft">{Math.round(progress * 100)}%</span>}
        </div>
        <UploadProgressBar value={progress} label={`Progress of ${u.fileName}`} tone={tone} />
        {(u.status === "received" || u.status === "failed") && canCreate && (
          <Link href={`/uploads/${u.id}/map`} className="mt-1 inline-block text-xs text-copper-dark underline">
            {u.status === "failed" ? "Check mapping and retry" : "Map and start"}
          </Link>
        )}
        {u.error && u.status !== "done" && <p className="mt-1 text-xs text-bad">{u.error}</p>}
      </td>
      <td><UploadCountsCell counts={u.counts} /></td>
      <td><UploadRejectedCell upload={u} /></td>
      <td><UploadSpansCell counts={u.counts} wellNames={wellNames} /></td>
    </tr>
  );
}
