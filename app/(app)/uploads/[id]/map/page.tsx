import type { Metadata } from "next";
import Link from "next/link";
import { notFound as pageNotFound } from "next/navigation";
import { requirePageActor } from "@/lib/auth/session";
import { isAppError } from "@/lib/errors";
import { getUpload } from "@/lib/services/uploads/get-upload";
import { listMappings } from "@/lib/services/mappings/list-mappings";
import { listWells } from "@/lib/services/wells/list-wells";
import { listFieldTree } from "@/lib/services/wells/list-field-tree";
import { suggestMapping } from "@/lib/ingest/suggest-mapping";
import { readDetection, UPLOAD_STATUS_LABEL, type SavedMappingRef, type UploadJson } from "@/components/upload-types";
import { listWellKeys, proposeTimeZone } from "@/components/upload-mapping-draft";
import { MappingForm, type WellChoice } from "./mapping-form";
import { listTimeZones } from "./time-zones";

export const metadata: Metadata = { title: "Map an upload" };

async function loadUpload(actor: Awaited<ReturnType<typeof requirePageActor>>, raw: string): Promise<UploadJson> {
  const id = Number(raw);
  if (!Number.isInteger(id) || id <= 0) pageNotFound();
  try {
    // Plain JSON, as the browser would see it from /api/uploads/[id].
    return JSON.parse(JSON.stringify(await getUpload(actor, id))) as UploadJson;
  } catch (e) {
    if (isAppError(e) && e.code === "not_found") pageNotFound();
    throw e;
  }
}

export default async function MapUploadPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor("uploads.create");
  const upload = await loadUpload(actor, (await params).id);
  const { detection, refusal } = readDetection(upload);

  const back = <Link href="/uploads" className="text-sm text-copper-dark underline">Back to uploads</Link>;
  if (!detection) {
    return (
      <div className="space-y-3">
        <h1 className="text-lg font-semibold">{upload.fileName}</h1>
        <p className="rounded bg-bad/10 px-2 py-1.5 text-sm text-bad" role="alert">{refusal ?? "The file could not be read."}</p>
        {back}
      </div>
    );
  }
  if (upload.status !== "received" && upload.status !== "failed") {
    return (
      <div className="space-y-3">
        <h1 className="text-lg font-semibold">{upload.fileName}</h1>
        <p className="text-sm">This upload is already past the mapping step (status: {UPLOAD_STATUS_LABEL[upload.status] ?? upload.status}).</p>
        {back}
      </div>
    );
  }

  const [wells, fields, saved] = await Promise.all([listWells(actor, {}), listFieldTree(actor), listMappings(actor)]);
  const fieldZone = new Map(fields.map((f) => [f.id, f.timeZone]));
  const wellChoices: WellChoice[] = wells.map((w) => ({
    id: w.id,
    name: w.name,
    uwi: w.uwi,
    timeZone: w.timeZone,
    fieldTimeZone: fieldZone.get(w.fieldId) ?? w.timeZone,
    label: `${w.name} · ${w.fieldName} / ${w.padName}`,
  }));
  const savedMappings: SavedMappingRef[] = JSON.parse(JSON.stringify(saved)) as SavedMappingRef[];

  // Start from the saved mapping that matched this header, else from the suggestion.
  const match = upload.savedMappingMatch ?? null;
  const start = match?.mapping ?? upload.suggestedMapping ?? suggestMapping(detection).mapping;
  const fallbackZone = fields[0]?.timeZone ?? "UTC";
  const initialZone = match ? start.timeZone : proposeTimeZone(listWellKeys(start, detection), wellChoices, fallbackZone);
  const initial = { ...start, timeZone: initialZone };

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
        <h1 className="text-lg font-semibold">Map {upload.fileName}</h1>
        {back}
      </div>
      {upload.status === "failed" && (
        <p className="max-w-3xl rounded bg-bad/10 px-2 py-1.5 text-sm text-bad" role="alert">
          The last import of this file failed{upload.error ? `: ${upload.error}` : ""}. Check the mapping and start again.
        </p>
      )}
      <p className="max-w-3xl text-sm text-ink-soft">
        Say which column holds the time, and which columns or tags are which signal of which well, in which unit. Values are
        converted to Bellows&apos; stored units when the file is processed; nothing is stored until you start processing.
      </p>
      {!match && (upload.mappingNotes?.length ?? 0) > 0 && (
        <ul className="max-w-3xl list-disc space-y-0.5 pl-5 text-xs text-warn" aria-label="Notes on the proposal">
          {upload.mappingNotes?.map((n) => <li key={n}>{n}</li>)}
        </ul>
      )}
      <MappingForm
        uploadId={upload.id}
        detection={detection}
        initial={initial}
        usingSaved={match ? { id: match.id, name: match.name } : null}
        savedMappings={savedMappings}
        wells={wellChoices}
        flaggedUnknownWells={upload.unknownWells ?? []}
        timeZones={listTimeZones([initialZone, ...fields.map((f) => f.timeZone)])}
      />
    </div>
  );
}
