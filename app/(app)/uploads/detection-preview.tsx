"use client";
// What the file check found in the head of one file: enough for a person to
// see at a glance whether the file was read the way they expect.
import Link from "next/link";
import { DELIMITER_LABEL, LAYOUT_LABEL, TIME_FORMAT_LABEL } from "@/components/upload-detection-labels";
import { readDetection, type UploadJson } from "@/components/upload-types";

const PREVIEW_ROWS = 5;

export function DetectionPreview({ upload }: { upload: UploadJson }) {
  const { detection: d, refusal } = readDetection(upload);
  if (!d) {
    return (
      <p className="rounded bg-bad/10 px-2 py-1.5 text-sm text-bad" role="alert">
        {refusal ?? "The file could not be read."}
      </p>
    );
  }
  const facts: [string, string][] = [
    ["Separator", DELIMITER_LABEL[d.delimiter]],
    ["Header row", `record ${d.headerRowIndex + 1}${d.headerRowIndex > 0 ? ` (${d.headerRowIndex} line${d.headerRowIndex === 1 ? "" : "s"} above skipped)` : ""}`],
    ["Layout", LAYOUT_LABEL[d.layout]],
    ["Time column", d.timeColumn],
    ["Time format", `${TIME_FORMAT_LABEL[d.timeFormat]}${d.hasTimeOffset ? ", with UTC offset" : ", local time"}`],
    ["Numbers", d.decimalComma ? "decimal comma" : "decimal point"],
  ];
  if (d.layout === "long") facts.push(["Tags seen", String(d.tagValues?.length ?? 0)]);
  const rows = d.preview.slice(0, PREVIEW_ROWS);

  return (
    <div className="space-y-3" data-testid="detection-preview">
      <dl className="grid grid-cols-1 gap-x-4 gap-y-1 text-sm sm:grid-cols-2 lg:grid-cols-3">
        {facts.map(([k, v]) => (
          <div key={k} className="flex gap-2">
            <dt className="shrink-0 text-ink-soft">{k}:</dt>
            <dd className="min-w-0 break-words">{v}</dd>
          </div>
        ))}
      </dl>
      {d.notes.length > 0 && (
        <ul className="list-disc space-y-0.5 pl-5 text-xs text-warn">
          {d.notes.map((n) => <li key={n}>{n}</li>)}
        </ul>
      )}
      <div className="overflow-x-auto rounded border border-line">
        <table className="data-table w-full">
          <caption className="sr-only">First rows of {upload.fileName}</caption>
          <thead>
            <tr>{d.columns.map((c, i) => <th key={`${c}-${i}`} scope="col" className="normal-case">{c}</th>)}</tr>
          </thead>
          <tbody>
            {rows.map((r, i) => (
              <tr key={i}>{d.columns.map((_, j) => <td key={j} className="whitespace-nowrap font-mono text-xs">{r[j] ?? ""}</td>)}</tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <Link
          href={`/uploads/${upload.id}/map`}
          className="rounded bg-ink px-3 py-1.5 text-sm font-medium text-paper hover:bg-ink/90"
        >
          Map columns and signals
        </Link>
        {upload.savedMappingMatch && (
          <span className="text-sm text-ink-soft">Same header as the saved mapping “{upload.savedMappingMatch.name}”.</span>
        )}
      </div>
    </div>
  );
}
