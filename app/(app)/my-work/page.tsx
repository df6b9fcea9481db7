import type { Metadata } from "next";
import Link from "next/link";
import { requirePageActor } from "@/lib/auth/session";
import { listRankedIssues } from "@/lib/services/issues/list-ranked-issues";
import { IssueStatusBadge } from "@/components/issue-status-badge";
import { formatDuration, formatRisk, severityTone } from "@/components/issue-format";
import { CautionNote } from "@/components/caution-note";

export const metadata: Metadata = { title: "My work" };

// The operator's phone list: open issues assigned to me, highest production at risk first.
export default async function MyWorkPage({ searchParams }: { searchParams: Promise<{ done?: string }> }) {
  const actor = await requirePageActor("issues.read");
  const showDone = (await searchParams).done === "1";
  const { rows, total } = await listRankedIssues(actor, {
    assignee: "me",
    status: showDone ? "resolved,verified" : "assigned,acknowledged,new,recurred",
    sort: showDone ? "lastChange" : "risk",
    pageSize: 100,
  });
  return (
    <div className="mx-auto max-w-xl space-y-3">
      <div className="flex items-baseline gap-3">
        <h1 className="text-lg font-semibold">My work</h1>
        <span className="text-sm text-ink-soft" data-testid="my-work-count">{total} {showDone ? "done" : "open"}</span>
        <Link href={showDone ? "/my-work" : "/my-work?done=1"} className="ml-auto text-sm text-copper-dark underline">{showDone ? "Show open" : "Show done"}</Link>
      </div>
      <CautionNote compact />
      {rows.length === 0 && <p className="rounded border border-line bg-paper-raised p-4 text-sm text-ink-soft">Nothing {showDone ? "done yet" : "assigned to you right now"}.</p>}
      <ul className="space-y-2" aria-label="Issues assigned to me">
        {rows.map((r) => (
          <li key={r.id}>
            <Link href={`/issues/${r.id}`} data-testid="my-work-card"
              className="block min-h-16 rounded border border-line bg-paper-raised p-4 active:bg-paper-sunk hover:border-ink-faint">
              <div className="flex items-center gap-2">
                <span className="text-base font-semibold">{r.wellName}</span>
                <IssueStatusBadge status={r.status} />
                {r.priority && r.priority !== "normal" && <span className="rounded bg-bad/10 px-1.5 py-0.5 text-xs font-medium text-bad">{r.priority}</span>}
              </div>
              <div className="mt-1 text-sm">{r.ruleLabel} · <span className={`rounded px-1 text-xs font-semibold ${severityTone(r.severity)}`}>sev {r.severity}</span></div>
              <div className="mt-1 text-sm text-ink-soft">{r.padName} · {formatRisk(r.productionAtRisk, r.unit)} at risk · {formatDuration(r.durationHours)}{r.dueOn ? ` · due ${r.dueOn}` : ""}</div>
            </Link>
          </li>
        ))}
      </ul>
    </div>
  );
}
