// The counts of one upload, split into small cells for the history table.
import { formatCount, formatWhen, REJECT_REASON_LABEL } from "@/components/upload-format";
import type { UploadCounts, UploadJson, WellNames } from "@/components/upload-types";

type Counts = Partial<UploadCounts> | null | undefined;

export function UploadCountsCell({ counts }: { counts: Counts }) {
  if (!counts) return <span className="text-ink-faint">—</span>;
  return (
    <dl className="grid grid-cols-[auto_auto] gap-x-2 whitespace-nowrap text-xs">
      <dt className="text-ink-soft">Rows read</dt>
      <dd className="text-right tabular-nums" data-testid="rows-read">{formatCount(counts.rowsRead)}</dd>
      <dt className="text-ink-soft">Values stored</dt>
      <dd className="text-right tabular-nums" data-testid="values-stored">{formatCount(counts.valuesStored)}</dd>
      <dt className="text-ink-soft">Duplicates merged</dt>
      <dd className="text-right tabular-nums">{formatCount(counts.duplicatesMerged)}</dd>
    </dl>
  );
}

export function UploadRejectedCell({ upload }: { upload: UploadJson }) {
  const byReason = Object.entries(upload.counts?.rejectedByReason ?? {}).filter(([, n]) => n > 0);
  const total = byReason.reduce((s, [, n]) => s + n, 0);
  if (total === 0 && !upload.hasRejections) return <span className="text-xs text-ink-faint">{upload.counts ? "none" : "—"}</span>;
  return (
    <div className="text-xs">
      <ul className="space-y-0.5">
        {byReason.map(([reason, n]) => (
          <li key={reason} className="whitespace-nowrap">
            <span className="tabular-nums">{formatCount(n)}</span> <span className="text-ink-soft">{REJECT_REASON_LABEL[reason] ?? reason}</span>
          </li>
        ))}
      </ul>
      {upload.hasRejections !== false && (
        <a href={`/api/uploads/${upload.id}/rejections`} className="mt-1 inline-block text-copper-dark underline" download>
          Rejected rows
        </a>
      )}
    </div>
  );
}

export function UploadSpansCell({ counts, wellNames }: { counts: Counts; wellNames: WellNames }) {
  const spans = Object.entries(counts?.spans ?? {});
  if (spans.length === 0) return <span className="text-ink-faint">—</span>;
  return (
    <ul className="space-y-0.5 text-xs">
      {spans.map(([well, s]) => (
        <li key={well} className="whitespace-nowrap">
          <span className="font-medium">{wellNames[well] ?? `Well ${well}`}</span>{" "}
          <span className="text-ink-soft">{formatWhen(s.from)} → {formatWhen(s.to)}</span>
        </li>
      ))}
    </ul>
  );
}
