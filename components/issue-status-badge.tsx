import { STATUS_LABEL, type IssueStatus } from "@/lib/validations/issues";

const TONE: Record<IssueStatus, string> = {
  new: "bg-copper-light text-copper-dark",
  acknowledged: "bg-paper-sunk text-ink",
  assigned: "bg-warn/15 text-warn",
  resolved: "bg-good/15 text-good",
  verified: "bg-good/25 text-good",
  recurred: "bg-bad/15 text-bad",
  dismissed: "bg-paper-sunk text-ink-faint",
  shelved: "bg-paper-sunk text-ink-soft",
};

export function IssueStatusBadge({ status }: { status: IssueStatus }) {
  return <span className={`inline-block rounded px-1.5 py-0.5 text-xs font-medium ${TONE[status]}`} data-testid="issue-status">{STATUS_LABEL[status]}</span>;
}
