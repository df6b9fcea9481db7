"use client";
// Drop or pick one or more historian CSV files. Each is sent on its own (a
// slow file does not hold up the others), shows its transfer progress, then
// what was detected and the way on to the mapping step.
import { useRef, useState } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { UploadProgressBar } from "@/components/upload-progress-bar";
import { formatBytes } from "@/components/upload-format";
import type { UploadJson } from "@/components/upload-types";
import { sendFile } from "./send-file";
import { DetectionPreview } from "./detection-preview";

interface Sending {
  key: string;
  fileName: string;
  size: number;
  loaded: number;
  phase: "sending" | "checking" | "received" | "failed";
  view?: UploadJson;
  error?: string;
}

let nextKey = 0;

export function UploadDropZone() {
  const [items, setItems] = useState<Sending[]>([]);
  const [isOver, setIsOver] = useState(false);
  const inputRef = useRef<HTMLInputElement>(null);
  const queryClient = useQueryClient();

  const patch = (key: string, p: Partial<Sending>) => setItems((xs) => xs.map((x) => (x.key === key ? { ...x, ...p } : x)));

  function start(files: FileList | File[]) {
    const list = Array.from(files);
    if (list.length === 0) return;
    const added = list.map((f) => ({ key: `f${nextKey++}`, fileName: f.name, size: f.size, loaded: 0, phase: "sending" as const }));
    setItems((xs) => [...added, ...xs]);
    list.forEach((file, i) => {
      const key = added[i].key;
      const h = sendFile(file, (loaded, total) => patch(key, { loaded, size: total, phase: loaded >= total ? "checking" : "sending" }));
      h.done
        .then((view) => patch(key, { phase: "received", view, loaded: file.size }))
        .catch((e: Error) => patch(key, { phase: "failed", error: e.message }))
        .finally(() => queryClient.invalidateQueries({ queryKey: ["uploads"] }));
    });
  }

  return (
    <section aria-labelledby="send-heading" className="space-y-3">
      <h2 id="send-heading" className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Send files</h2>
      <div
        onDragOver={(e) => {
          e.preventDefault();
          setIsOver(true);
        }}
        onDragLeave={() => setIsOver(false)}
        onDrop={(e) => {
          e.preventDefault();
          setIsOver(false);
          start(e.dataTransfer.files);
        }}
        className={`rounded border-2 border-dashed p-5 text-center text-sm transition-colors ${isOver ? "border-copper bg-copper-light/50" : "border-line bg-paper-raised"}`}
        data-testid="upload-drop-zone"
      >
        <p className="mb-3 text-ink-soft">Drop CSV files here, or choose them.</p>
        <label htmlFor="historian-files" className="field-label mx-auto w-fit">Historian CSV files</label>
        <input
          ref={inputRef}
          id="historian-files"
          type="file"
          multiple
          accept=".csv,.tsv,.txt,text/csv,text/plain,text/tab-separated-values"
          className="mx-auto block max-w-full text-sm file:mr-3 file:rounded file:border-0 file:bg-ink file:px-3 file:py-1.5 file:text-paper"
          onChange={(e) => {
            if (e.target.files) start(e.target.files);
            // Let the same file be chosen again after a fix.
            if (inputRef.current) inputRef.current.value = "";
          }}
        />
        <p className="mt-3 text-xs text-ink-faint">Long files (one row per reading, with a tag column) and wide files (one column per signal) are both read.</p>
      </div>

      {items.length > 0 && (
        <ul className="space-y-3" aria-label="Files sent in this visit">
          {items.map((it) => (
            <li key={it.key} className="rounded border border-line bg-paper-raised p-3" data-testid="sent-file">
              <div className="mb-2 flex flex-wrap items-baseline gap-x-3 gap-y-1">
                <span className="break-all font-medium">{it.fileName}</span>
                <span className="text-xs text-ink-soft">{formatBytes(it.size)}</span>
                <span className="ml-auto text-xs text-ink-soft" role="status">{phaseText(it)}</span>
              </div>
              {(it.phase === "sending" || it.phase === "checking") && (
                <UploadProgressBar value={it.size > 0 ? it.loaded / it.size : 0} label={`Transfer of ${it.fileName}`} />
              )}
              {it.phase === "failed" && <p className="text-sm text-bad" role="alert">{it.error}</p>}
              {it.view && <DetectionPreview upload={it.view} />}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

function phaseText(it: Sending): string {
  switch (it.phase) {
    case "sending": return `Sending… ${it.size > 0 ? Math.round((it.loaded / it.size) * 100) : 0}%`;
    case "checking": return "Sent; checking the file…";
    case "received": return it.view?.status === "refused" ? "Not accepted" : "Received";
    case "failed": return "Not sent";
  }
}
