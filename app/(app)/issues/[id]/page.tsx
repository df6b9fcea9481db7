import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageActor } from "@/lib/auth/session";
import { can } from "@/lib/auth/roles";
import { isAppError } from "@/lib/errors";
import { getIssue, type IssueDetail } from "@/lib/services/issues/get-issue";
import { listOrgOperators } from "@/lib/services/issues/list-org-operators";
import { listResolutionActions } from "@/lib/services/issues/list-resolution-actions";
import { getOrgContext } from "@/lib/services/org/get-org-context";
import { DISMISS_REASON_LABEL, STATUS_LABEL, type IssueStatus } from "@/lib/validations/issues";
import { CautionNote } from "@/components/caution-note";
import { IssueStatusBadge } from "@/components/issue-status-badge";
import { formatDuration, formatRisk, formatWhen, severityTone } from "@/components/issue-format";
import { IssueChart } from "./issue-chart";
import { TriageControls } from "./triage-controls";
import { IssueDiscussion } from "./issue-discussion";

export const metadata: Metadata = { title: "Issue" };

async function loadIssue(actor: Parameters<typeof getIssue>[0], id: number): Promise<IssueDetail> {
  try {
    return await getIssue(actor, id);
  } catch (e) {
    if (isAppError(e) && e.code === "not_found") notFound();
    throw e;
  }
}

const EVENT_LABEL: Record<string, string> = {
  acknowledge: "acknowledged", assign: "assigned", resolve: "resolved", dismiss: "dismissed", shelve: "shelved",
  reopen: "reopened", comment: "commented", photo: "added a photo", open: "opened", recur: "recurred", verify: "verified",
};

function describeEvent(e: IssueDetail["history"][number]): string {
  const d = e.data as Record<string, string | null | undefined>;
  const extra =
    e.kind === "assign" ? ` to ${d.assigneeName ?? "an operator"}${d.priority ? ` (priority ${d.priority}${d.dueOn ? `, due ${d.dueOn}` : ""})` : ""}`
    : e.kind === "resolve" ? `: ${d.action ?? ""}${d.note ? ` — “${d.note}”` : ""}`
    : e.kind === "dismiss" ? `: ${DISMISS_REASON_LABEL[d.reason as keyof typeof DISMISS_REASON_LABEL] ?? d.reason ?? ""}${d.note ? ` — “${d.note}”` : ""}`
    : e.kind === "shelve" ? ` until ${d.until ? formatWhen(d.until) : "?"}`
    : e.kind === "photo" ? ` (${d.fileName ?? ""})` : "";
  const status = e.fromStatus && e.toStatus && e.fromStatus !== e.toStatus
    ? ` · ${STATUS_LABEL[e.fromStatus as IssueStatus] ?? e.fromStatus} → ${STATUS_LABEL[e.toStatus as IssueStatus] ?? e.toStatus}` : "";
  return `${e.userName ?? "Bellows"} ${EVENT_LABEL[e.kind] ?? e.kind}${extra}${status}`;
}

export default async function IssuePage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor("issues.read");
  const id = Number((await params).id);
  const issue = await loadIssue(actor, id);
  const canTriage = can(actor.role, "issues.triage");
  const [operators, resolutionActions, ctx] = await Promise.all([canTriage ? listOrgOperators(actor) : Promise.resolve([]), listResolutionActions(actor), getOrgContext(actor)]);
  const windowEnd = issue.endedAt ?? issue.lastSeenAt;
  const now = new Date();
  const dates = { today: now.toISOString().slice(0, 10), tomorrow: new Date(now.getTime() + 86_400_000).toISOString().slice(0, 10) };
  const hours = (new Date(windowEnd).getTime() - new Date(issue.startedAt).getTime()) / 3_600_000;
  const valve = (n: number) => `valve ${n} (counting from the top)`;
  const isValveMismatch = issue.inferredOperatingValve !== null && issue.expectedOperatingValve !== null && issue.inferredOperatingValve !== issue.expectedOperatingValve;

  return (
    <div className="space-y-4">
      <nav className="text-sm"><Link href={actor.role === "operator" ? "/my-work" : "/issues"} className="text-copper-dark underline">← {actor.role === "operator" ? "My work" : "All issues"}</Link></nav>
      <header className="flex flex-wrap items-center gap-3">
        <h1 className="text-lg font-semibold">{issue.ruleLabel} on {issue.well.name}</h1>
        <IssueStatusBadge status={issue.status} />
        <span className={`rounded px-1.5 py-0.5 text-xs font-semibold ${severityTone(issue.severity)}`}>severity {issue.severity}</span>
        <span className="text-sm text-ink-soft">{issue.well.fieldName} / {issue.well.padName} · issue #{issue.id}{issue.recurrenceCount ? ` · recurred ${issue.recurrenceCount}×` : ""}</span>
      </header>

      <div className="grid gap-4 lg:grid-cols-3">
        {/* On a phone the actions come first; on a wide screen they sit in the right column. */}
        <aside aria-label="Triage" className="order-first space-y-3 lg:order-last">
          <CautionNote compact />
          {issue.assignee && (
            <p className="text-sm">Assigned to <strong>{issue.assignee.name}</strong>{issue.priority ? ` · priority ${issue.priority}` : ""}{issue.dueOn ? ` · due ${issue.dueOn}` : ""}</p>
          )}
          {issue.resolvedAction && (
            <p className="text-sm" data-testid="resolution">Resolved{issue.resolvedAt ? ` ${formatWhen(issue.resolvedAt)}` : ""}: <strong>{issue.resolvedAction}</strong>{issue.resolvedNote ? ` — ${issue.resolvedNote}` : ""}</p>
          )}
          {issue.shelvedUntil && issue.status === "shelved" && <p className="text-sm">Shelved until {formatWhen(issue.shelvedUntil)}</p>}
          <TriageControls issueId={issue.id} allowed={issue.allowedActions} operators={operators} resolutionActions={resolutionActions} currentAssigneeId={issue.assignee?.id ?? null} dates={dates} />
        </aside>

        <div className="space-y-4 lg:col-span-2">
          <section aria-labelledby="what-h" className="rounded border border-line bg-paper-raised p-4">
            <h2 id="what-h" className="mb-2 text-sm font-semibold">What Bellows saw</h2>
            <p className="text-sm">{issue.summary}</p>
            <p className="mt-2 text-sm text-ink-soft">
              Window: {formatWhen(issue.startedAt)} → {issue.endedAt ? formatWhen(issue.endedAt) : `still present (last seen ${formatWhen(issue.lastSeenAt)})`} · {formatDuration(hours)}
            </p>
            {issue.evidence.length > 0 && (
              <table className="data-table mt-3 w-full" aria-label="Evidence">
                <thead><tr><th scope="col">Measured</th><th scope="col">Value</th><th scope="col">Threshold</th><th scope="col">In plain words</th></tr></thead>
                <tbody>
                  {issue.evidence.map((ev, i) => (
                    <tr key={i}>
                      <td>{ev.label}</td>
                      <td>{Number.isFinite(ev.value) ? ev.value.toLocaleString("en-US", { maximumFractionDigits: 2 }) : "—"} {ev.unit}</td>
                      <td>{Number.isFinite(ev.threshold) ? ev.threshold.toLocaleString("en-US", { maximumFractionDigits: 2 }) : "—"} {ev.unit}</td>
                      <td>{ev.text}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            )}
          </section>

          <section aria-labelledby="risk-h" className="grid gap-3 sm:grid-cols-2">
            <div className="rounded border border-line bg-paper-raised p-4">
              <h2 id="risk-h" className="mb-1 text-sm font-semibold">Production at risk</h2>
              <p className="text-lg font-semibold" data-testid="production-at-risk">{formatRisk(issue.productionAtRisk.value, issue.productionAtRisk.unit)}</p>
              <p className="mt-1 text-xs text-ink-soft">How it was estimated: {issue.productionAtRisk.method ?? "not recorded"}</p>
            </div>
            <div className="rounded border border-line bg-paper-raised p-4" data-testid="operating-valve">
              <h2 className="mb-1 text-sm font-semibold">Operating valve</h2>
              <p className="text-sm">
                {issue.expectedOperatingValve === null ? "The valve design does not say which valve should pass gas." : `The valve design expects gas through ${valve(issue.expectedOperatingValve)}.`}
              </p>
              <p className="text-sm">
                {issue.inferredOperatingValve === null
                  ? "The trends behind this issue do not show which valve passes gas."
                  : `The trends suggest gas enters through ${valve(issue.inferredOperatingValve)}.`}
              </p>
              {isValveMismatch && <p className="mt-1 text-xs font-medium text-warn">Injecting shallower than designed: worth a look at the valve string.</p>}
              <p className="mt-1 text-xs text-ink-soft">{issue.well.mandrels.length} mandrels · design injection pressure {issue.well.injectionPressurePsig} psig</p>
            </div>
          </section>

          <IssueChart wellId={issue.well.id} from={issue.startedAt} to={windowEnd} issueId={issue.id} timeZone={issue.well.timeZone} unitSystem={ctx.unitSystem} nowMs={now.getTime()} />

          <section aria-labelledby="history-h" className="rounded border border-line bg-paper-raised p-4">
            <h2 id="history-h" className="mb-2 text-sm font-semibold">History</h2>
            <ol className="space-y-1 text-sm" data-testid="issue-history">
              <li className="text-ink-soft">{formatWhen(issue.startedAt)} · signature first seen</li>
              {issue.history.map((e) => <li key={e.id}><span className="text-ink-soft">{formatWhen(e.at)}</span> · {describeEvent(e)}</li>)}
            </ol>
          </section>

          <section aria-labelledby="talk-h" className="rounded border border-line bg-paper-raised p-4">
            <h2 id="talk-h" className="mb-2 text-sm font-semibold">Comments and photos</h2>
            <ul className="mb-3 space-y-2 text-sm">
              {issue.comments.map((c) => <li key={c.id}><span className="font-medium">{c.userName ?? "someone"}</span> <span className="text-xs text-ink-soft">{formatWhen(c.at)}</span><p className="whitespace-pre-wrap">{c.body}</p></li>)}
              {issue.comments.length === 0 && <li className="text-ink-faint">No comments yet.</li>}
            </ul>
            {issue.photos.length > 0 && (
              <ul className="mb-3 flex flex-wrap gap-2">
                {issue.photos.map((p) => (
                  <li key={p.id}>
                    <a href={p.url} target="_blank" rel="noreferrer">
                      {/* eslint-disable-next-line @next/next/no-img-element -- served by our own checked route, not the image optimizer */}
                      <img src={p.url} alt={`Photo ${p.fileName} by ${p.userName ?? "someone"}`} className="h-24 w-24 rounded border border-line object-cover" />
                    </a>
                  </li>
                ))}
              </ul>
            )}
            {issue.canComment && <IssueDiscussion issueId={issue.id} />}
          </section>
        </div>
      </div>
    </div>
  );
}
