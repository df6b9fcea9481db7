"use client";
// The person's saved views of the list: apply, save the current one, delete.
import { useState, useTransition } from "react";
import Link from "next/link";
import { useRouter, useSearchParams } from "next/navigation";
import { issueQueryString } from "@/components/issue-table";
import { deleteFilterAction, saveFilterAction } from "./actions";

export function SavedFilters({ filters }: { filters: { id: number; name: string; query: string }[] }) {
  const sp = useSearchParams();
  const router = useRouter();
  const [name, setName] = useState("");
  const [message, setMessage] = useState<string | null>(null);
  const [isPending, start] = useTransition();
  const save = () =>
    start(async () => {
      const r = await saveFilterAction(name, issueQueryString(new URLSearchParams(sp.toString())));
      setMessage(r.ok ? `Saved “${r.data.name}”` : r.message);
      if (r.ok) { setName(""); router.refresh(); }
    });
  return (
    <section aria-label="Saved filters" className="flex flex-wrap items-center gap-2 text-sm">
      <span className="text-ink-soft">Saved views:</span>
      {filters.length === 0 && <span className="text-ink-faint">none yet</span>}
      {filters.map((f) => (
        <span key={f.id} className="inline-flex items-center gap-1 rounded border border-line bg-paper-raised px-2 py-0.5">
          <Link href={`/issues?${f.query}`} className="text-copper-dark hover:underline">{f.name}</Link>
          <button type="button" aria-label={`Delete saved view ${f.name}`} className="text-ink-faint hover:text-bad" disabled={isPending}
            onClick={() => start(async () => { const r = await deleteFilterAction(f.id); if (r.ok) router.refresh(); else setMessage(r.message); })}>×</button>
        </span>
      ))}
      <label htmlFor="saved-name" className="sr-only">Name for this view</label>
      <div className="w-48"><input id="saved-name" value={name} onChange={(e) => setName(e.target.value)} placeholder="Name this view" className="field-input" maxLength={80} /></div>
      <button type="button" onClick={save} disabled={!name.trim() || isPending} className="rounded border border-line bg-paper-raised px-2 py-1 disabled:opacity-50">Save view</button>
      {message && <span role="status" className="text-xs text-ink-soft">{message}</span>}
    </section>
  );
}
