import { WELL_STATUS_LABEL, WELL_STATUSES } from "@/lib/validations/well";

type WellStatus = (typeof WELL_STATUSES)[number];

// Colour only repeats the word; the label carries the meaning.
const TONE: Record<WellStatus, string> = {
  producing: "border-good/40 bg-good/10 text-good",
  kicking_off: "border-copper/40 bg-copper-light text-copper-dark",
  shut_in: "border-warn/40 bg-warn/10 text-ink",
  suspended: "border-line bg-paper-sunk text-ink-soft",
};

export function WellStatusBadge({ status }: { status: WellStatus }) {
  return (
    <span className={`inline-block rounded border px-1.5 py-0.5 text-xs font-medium ${TONE[status]}`} data-testid="well-status">
      {WELL_STATUS_LABEL[status]}
    </span>
  );
}
