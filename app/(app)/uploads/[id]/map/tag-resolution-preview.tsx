"use client";
// How the tags seen in the head of the file read under the current rule, so a
// wrong pattern shows before any row is processed.
import { SIGNAL_LABEL } from "@/lib/signals";
import type { TagTarget } from "@/lib/ingest/resolve-tag";
import { unitText } from "@/components/upload-signal-select";

const SHOW = 40;

export function TagResolutionPreview({ rows }: { rows: { tag: string; target: TagTarget | null }[] }) {
  if (rows.length === 0) return null;
  const unmatched = rows.filter((r) => !r.target).length;
  return (
    <details className="rounded border border-line bg-paper-raised" open={unmatched > 0}>
      <summary className="cursor-pointer px-3 py-2 text-sm">
        Tags seen: {rows.length}; read: {rows.length - unmatched}
        {unmatched > 0 && <span className="text-warn">; not read: {unmatched} (their rows will be refused)</span>}
      </summary>
      <div className="overflow-x-auto">
        <table className="data-table w-full">
          <caption className="sr-only">How each tag is read</caption>
          <thead><tr><th scope="col">Tag</th><th scope="col">Well</th><th scope="col">Signal</th><th scope="col">Unit</th></tr></thead>
          <tbody>
            {rows.slice(0, SHOW).map((r) => (
              <tr key={r.tag}>
                <td className="font-mono text-xs">{r.tag}</td>
                {r.target ? (
                  <>
                    <td>{r.target.wellKey}</td>
                    <td>{SIGNAL_LABEL[r.target.signal]}</td>
                    <td>{r.target.unit ? unitText(r.target.unit) : <span className="text-warn">not set</span>}</td>
                  </>
                ) : (
                  <td colSpan={3} className="text-warn">not read by the rule</td>
                )}
              </tr>
            ))}
          </tbody>
        </table>
        {rows.length > SHOW && <p className="px-3 py-2 text-xs text-ink-soft">and {rows.length - SHOW} more.</p>}
      </div>
    </details>
  );
}
