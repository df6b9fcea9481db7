"use client";
// Register import in two steps: the file is read as text in the browser and
// sent for a preview (nothing written), then the very same text is sent again
// with apply=true when the user confirms.
import { useState } from "react";
import Link from "next/link";
import type { ImportResult } from "@/lib/services/wells/import-register-csv";
import { importRegisterAction } from "../actions";
import { RegisterImportTables } from "./import-tables";

/** Same ceiling as the service; checked here first so a huge file is never uploaded. */
const MAX_FILE_BYTES = 5 * 1024 * 1024;

type Step =
  | { kind: "idle" }
  | { kind: "busy"; what: string }
  | { kind: "preview"; result: ImportResult }
  | { kind: "applied"; result: ImportResult };

export function ImportForm() {
  const [file, setFile] = useState<{ name: string; text: string } | null>(null);
  const [step, setStep] = useState<Step>({ kind: "idle" });
  const [error, setError] = useState<string | null>(null);

  async function onFileChange(e: React.ChangeEvent<HTMLInputElement>) {
    setError(null);
    setStep({ kind: "idle" });
    setFile(null);
    const chosen = e.target.files?.[0];
    if (!chosen) return;
    if (chosen.size > MAX_FILE_BYTES) {
      setError(`${chosen.name} is ${(chosen.size / 1024 / 1024).toFixed(1)} MB; a register file may be at most 5 MB.`);
      return;
    }
    const text = await chosen.text();
    setFile({ name: chosen.name, text });
    await send({ name: chosen.name, text }, false);
  }

  async function send(f: { name: string; text: string }, apply: boolean) {
    setError(null);
    setStep({ kind: "busy", what: apply ? "Importing…" : "Checking the file…" });
    try {
      const r = await importRegisterAction({ text: f.text, fileName: f.name, apply });
      if (!r.ok) {
        setError(r.message);
        setStep({ kind: "idle" });
        return;
      }
      setStep({ kind: apply ? "applied" : "preview", result: r.data });
    } catch {
      setError("The server could not be reached; try again.");
      setStep({ kind: "idle" });
    }
  }

  return (
    <div className="space-y-4">
      <div className="rounded border border-line bg-paper-raised p-3">
        <label htmlFor="register-file" className="field-label">CSV file</label>
        <input
          id="register-file"
          type="file"
          accept=".csv,text/csv"
          onChange={onFileChange}
          className="block text-sm file:mr-3 file:rounded file:border file:border-line file:bg-paper file:px-3 file:py-1.5 file:text-sm"
          data-testid="register-file"
        />
        <p className="mt-1 text-xs text-ink-soft">A well list or a valve design, up to 5 MB. The file is checked first; nothing is written until you confirm.</p>
      </div>

      {error && <p role="alert" className="rounded bg-bad/10 px-2 py-1 text-sm text-bad">{error}</p>}
      {step.kind === "busy" && <p role="status" className="text-sm text-ink-soft">{step.what}</p>}

      {step.kind === "preview" && file && (
        <section aria-label="Import preview" className="space-y-3" data-testid="import-preview">
          <h2 className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Preview of {file.name}</h2>
          <RegisterImportTables result={step.result} />
          <div className="flex flex-wrap items-center gap-3">
            <button
              type="button"
              onClick={() => send(file, true)}
              className="rounded bg-ink px-4 py-2 text-sm font-medium text-paper hover:bg-ink/90"
            >
              Confirm import
            </button>
            {step.result.errors.length > 0 && (
              <p className="text-xs text-ink-soft">Wells with any row in error are skipped; the others are written.</p>
            )}
          </div>
        </section>
      )}

      {step.kind === "applied" && file && (
        <section aria-label="Import result" className="space-y-3" data-testid="import-result">
          <h2 className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Imported {file.name}</h2>
          <p role="status" className="rounded bg-good/10 px-2 py-1 text-sm">{summarizeApplied(step.result)}</p>
          <RegisterImportTables result={step.result} />
          <Link href="/wells" className="text-sm text-copper-dark underline">Back to the wells</Link>
        </section>
      )}
    </div>
  );
}

function summarizeApplied(r: ImportResult): string {
  const count = (a: string) => r.changes.filter((c) => c.action === a).length;
  const written = count("create") + count("update");
  const noun = r.kind === "wells" ? "well" : "valve string";
  if (written === 0) return `Nothing was written: ${count("skipped")} skipped, ${count("unchanged")} unchanged.`;
  return `Written: ${count("create")} new and ${count("update")} changed ${noun}${written === 1 ? "" : "s"}; ${count("skipped")} skipped, ${count("unchanged")} unchanged.`;
}
