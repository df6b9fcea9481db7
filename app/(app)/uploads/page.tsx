import type { Metadata } from "next";
import { requirePageActor } from "@/lib/auth/session";
import { can } from "@/lib/auth/roles";
import { listWells } from "@/lib/services/wells/list-wells";
import { QueryProvider } from "@/components/query-provider";
import { UploadDropZone } from "./upload-drop-zone";
import { UploadHistory } from "./upload-history";

export const metadata: Metadata = { title: "Uploads" };

export default async function UploadsPage({ searchParams }: { searchParams: Promise<{ queued?: string }> }) {
  const actor = await requirePageActor("uploads.read");
  const canCreate = can(actor.role, "uploads.create");
  // The worker reports time spans per well id; the table shows names.
  const wellNames = Object.fromEntries((await listWells(actor, {})).map((w) => [String(w.id), w.name]));
  const isQueuedLater = (await searchParams).queued === "later";
  return (
    <div className="space-y-6">
      {isQueuedLater && (
        <p className="rounded bg-warn/10 px-2 py-1.5 text-sm" role="status">
          The import queue cannot be reached right now. Your upload is saved and starts by itself when the worker reconnects.
        </p>
      )}
      <div>
        <h1 className="text-lg font-semibold">Historian uploads</h1>
        <p className="text-sm text-ink-soft">
          Send CSV exports from the SCADA historian. Each file is checked, then you confirm which columns or tags are which
          signal before its values are stored.
        </p>
      </div>
      <QueryProvider>
        {canCreate && <UploadDropZone />}
        <UploadHistory canCreate={canCreate} wellNames={wellNames} />
      </QueryProvider>
    </div>
  );
}
