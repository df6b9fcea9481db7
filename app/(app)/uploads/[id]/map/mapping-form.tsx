"use client";
// The mapping step. The draft is checked in the browser with the same
// MappingSchema the server uses, so the button only sends what will pass;
// the server's issues still land on the page if anything else is wrong.
import { useMemo, useState, useTransition } from "react";
import Link from "next/link";
import { MappingSchema, type Mapping } from "@/lib/ingest/mapping";
import { TIME_FORMATS, type Detection, type Layout, type TimeFormat } from "@/lib/ingest/types";
import { LAYOUT_LABEL, TIME_FORMAT_LABEL } from "@/components/upload-detection-labels";
import type { SavedMappingRef } from "@/components/upload-types";
import {
  draftFromMapping,
  listUnknownWellKeys,
  listWellKeys,
  mappingFromDraft,
  resolveSeenTags,
  type MappingDraft,
  type WellOption,
} from "@/components/upload-mapping-draft";
import { submitMappingAction } from "./actions";
import { WideColumnsEditor } from "./wide-columns-editor";
import { LongTagsEditor } from "./long-tags-editor";
import { TagResolutionPreview } from "./tag-resolution-preview";
import { WellMatchesEditor } from "./well-matches-editor";

export interface WellChoice extends WellOption {
  fieldTimeZone: string;
  label: string;
}

interface Props {
  uploadId: number;
  detection: Detection;
  initial: Mapping;
  usingSaved: { id: number; name: string } | null;
  savedMappings: SavedMappingRef[];
  wells: WellChoice[];
  flaggedUnknownWells: string[];
  timeZones: string[];
}

export function MappingForm({ uploadId, detection: d, initial, usingSaved, savedMappings, wells, flaggedUnknownWells, timeZones }: Props) {
  const [draft, setDraft] = useState<MappingDraft>(() => draftFromMapping(initial, d, wells));
  const [source, setSource] = useState(usingSaved);
  const [isZoneChosen, setIsZoneChosen] = useState(usingSaved !== null);
  const [matches, setMatches] = useState<Record<string, number>>({});
  const [saveAs, setSaveAs] = useState("");
  const [serverError, setServerError] = useState<{ message: string; issues: { path: string; message: string }[] } | null>(null);
  const [isPending, startTransition] = useTransition();

  const mapping = useMemo(() => mappingFromDraft(draft, wells), [draft, wells]);
  const check = useMemo(() => MappingSchema.safeParse(mapping), [mapping]);
  const keys = useMemo(() => listWellKeys(mapping, d), [mapping, d]);
  const unknownKeys = useMemo(() => listUnknownWellKeys(keys, wells, flaggedUnknownWells), [keys, wells, flaggedUnknownWells]);
  const tagRows = useMemo(() => resolveSeenTags(mapping, d), [mapping, d]);
  const localIssues = check.success ? [] : check.error.issues.map((i) => ({ path: i.path.join("."), message: i.message }));

  const setTop = (p: Partial<MappingDraft>) => setDraft((x) => ({ ...x, ...p }));

  function chooseOneWell(p: Partial<MappingDraft["wide"]>) {
    setDraft((x) => {
      const next = { ...x, wide: { ...x.wide, ...p } };
      // Propose the chosen well's field zone unless someone picked a zone already.
      const w = p.wellId ? wells.find((y) => y.id === p.wellId) : undefined;
      if (w && !isZoneChosen) next.timeZone = w.fieldTimeZone;
      return next;
    });
  }

  function loadSaved(id: string) {
    const s = savedMappings.find((m) => String(m.id) === id);
    if (!s) return;
    setDraft(draftFromMapping(s.mapping, d, wells));
    setSource({ id: s.id, name: s.name });
    setIsZoneChosen(true);
  }

  function submit() {
    setServerError(null);
    if (!check.success) return;
    const wellMatches: Record<string, number> = {};
    for (const k of unknownKeys) if (matches[k]) wellMatches[k] = matches[k];
    // The one well of a wide file is named by its registered name; say which well that is.
    if (draft.layout === "wide" && draft.wide.wellMode === "one" && draft.wide.wellId && mapping.wide?.wellKey) {
      wellMatches[mapping.wide.wellKey] = draft.wide.wellId;
    }
    startTransition(async () => {
      const r = await submitMappingAction(uploadId, { mapping: check.data, saveMappingAs: saveAs.trim() || undefined, wellMatches });
      if (r && !r.ok) setServerError({ message: r.message, issues: r.issues });
    });
  }

  return (
    <form
      className="space-y-5"
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <div className="flex flex-wrap items-end gap-3">
        {source ? (
          <p className="rounded bg-good/10 px-2 py-1 text-sm text-good" role="status" data-testid="using-saved-mapping">
            Using saved mapping “{source.name}”.
          </p>
        ) : (
          <p className="text-sm text-ink-soft" role="status">Proposed from the file&apos;s headers; check each choice.</p>
        )}
        {savedMappings.length > 0 && (
          <div className="ml-auto min-w-56">
            <label htmlFor="load-saved" className="field-label">Start from a saved mapping</label>
            <select id="load-saved" className="field-input" value="" onChange={(e) => loadSaved(e.target.value)}>
              <option value="">Choose…</option>
              {savedMappings.map((m) => <option key={m.id} value={m.id}>{m.name}</option>)}
            </select>
          </div>
        )}
      </div>

      <section className="space-y-3 rounded border border-line bg-paper-raised p-3" aria-labelledby="time-heading">
        <h2 id="time-heading" className="text-sm font-semibold">Layout and time</h2>
        <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
          <div>
            <label htmlFor="layout" className="field-label">Layout</label>
            <select id="layout" className="field-input" value={draft.layout} onChange={(e) => setTop({ layout: e.target.value as Layout })}>
              {(["wide", "long"] as const).map((l) => <option key={l} value={l}>{LAYOUT_LABEL[l]}</option>)}
            </select>
          </div>
          <div>
            <label htmlFor="time-column" className="field-label">Time column</label>
            <select id="time-column" className="field-input" value={draft.timeColumn} onChange={(e) => setTop({ timeColumn: e.target.value })}>
              {d.columns.map((c) => <option key={c} value={c}>{c}</option>)}
            </select>
          </div>
          <div>
            <label htmlFor="time-format" className="field-label">Time format</label>
            <select id="time-format" className="field-input" value={draft.timeFormat} onChange={(e) => setTop({ timeFormat: e.target.value as TimeFormat })}>
              {TIME_FORMATS.map((f) => <option key={f} value={f}>{TIME_FORMAT_LABEL[f]}</option>)}
            </select>
          </div>
          <div>
            <label htmlFor="time-zone" className="field-label">Time zone of times without an offset</label>
            <select
              id="time-zone"
              className="field-input"
              value={draft.timeZone}
              onChange={(e) => {
                setIsZoneChosen(true);
                setTop({ timeZone: e.target.value });
              }}
            >
              {timeZones.map((z) => <option key={z} value={z}>{z}</option>)}
            </select>
            {d.hasTimeOffset && <p className="mt-1 text-xs text-ink-faint">The file&apos;s times carry an offset; the zone is used only where one is missing.</p>}
          </div>
        </div>
      </section>

      <section className="space-y-3 rounded border border-line bg-paper-raised p-3" aria-labelledby="signals-heading">
        <h2 id="signals-heading" className="text-sm font-semibold">{draft.layout === "wide" ? "Wells and columns" : "Tags"}</h2>
        {draft.layout === "wide" ? (
          <WideColumnsEditor draft={draft} detection={d} wells={wells} onChange={chooseOneWell} />
        ) : (
          <>
            <LongTagsEditor draft={draft} detection={d} onChange={(p) => setDraft((x) => ({ ...x, long: { ...x.long, ...p } }))} />
            <TagResolutionPreview rows={tagRows} />
          </>
        )}
      </section>

      <WellMatchesEditor keys={unknownKeys} wells={wells} matches={matches} onChange={setMatches} />

      <section className="grid gap-3 sm:grid-cols-2" aria-label="Save and start">
        <div>
          <label htmlFor="save-as" className="field-label">Save this mapping as (optional)</label>
          <input id="save-as" className="field-input" maxLength={120} value={saveAs} onChange={(e) => setSaveAs(e.target.value)} placeholder="e.g. North pad hourly export" />
          <p className="mt-1 text-xs text-ink-faint">Later files with the same header use it automatically.</p>
        </div>
      </section>

      {(localIssues.length > 0 || serverError) && (
        <div className="rounded bg-bad/10 px-3 py-2 text-sm text-bad" role="alert">
          <p className="font-medium">{serverError?.message ?? "Before starting, fix:"}</p>
          <ul className="list-disc pl-5">
            {[...(serverError?.issues ?? []), ...localIssues].map((i, n) => (
              <li key={n}>{i.path ? `${i.path}: ` : ""}{i.message}</li>
            ))}
          </ul>
        </div>
      )}

      <div className="flex flex-wrap items-center gap-3">
        <button type="submit" disabled={!check.success || isPending} className="rounded bg-ink px-4 py-2 text-sm font-medium text-paper hover:bg-ink/90 disabled:opacity-50">
          {isPending ? "Starting…" : "Start processing"}
        </button>
        <Link href="/uploads" className="text-sm text-ink-soft underline">Cancel</Link>
      </div>
    </form>
  );
}
