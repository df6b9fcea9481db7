"use client";
// Admins and engineers keep the organization's list of resolution actions
// (what an operator can record as done), one per line.
import { useState, useTransition } from "react";
import { saveResolutionActionsAction } from "./actions";

export function ResolutionActionsEditor({ actions }: { actions: string[] }) {
  const [text, setText] = useState(actions.join("\n"));
  const [message, setMessage] = useState<string | null>(null);
  const [isPending, start] = useTransition();
  return (
    <details className="rounded border border-line bg-paper-raised p-3 text-sm">
      <summary className="cursor-pointer font-medium">Resolution actions for operators</summary>
      <p className="my-2 text-xs text-ink-soft">One per line. Operators choose one of these when they resolve an issue.</p>
      <label htmlFor="resolution-actions" className="field-label">Actions</label>
      <textarea id="resolution-actions" rows={7} value={text} onChange={(e) => setText(e.target.value)} className="field-input font-mono" />
      <div className="mt-2 flex items-center gap-2">
        <button type="button" disabled={isPending} className="rounded bg-ink px-3 py-1.5 font-medium text-paper disabled:opacity-50"
          onClick={() => start(async () => {
            const r = await saveResolutionActionsAction(text.split("\n").map((s) => s.trim()).filter(Boolean));
            setMessage(r.ok ? "Saved" : r.message + (r.issues.length ? `: ${r.issues.map((i) => i.message).join(", ")}` : ""));
          })}>Save actions</button>
        {message && <span role="status" className="text-xs text-ink-soft">{message}</span>}
      </div>
    </details>
  );
}
