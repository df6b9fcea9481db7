import type { Metadata } from "next";
import { Suspense } from "react";
import { redirect } from "next/navigation";
import { requirePageActor } from "@/lib/auth/session";
import { can } from "@/lib/auth/roles";
import { getIssueSummary } from "@/lib/services/issues/get-issue-summary";
import { listSavedFilters } from "@/lib/services/issues/list-saved-filters";
import { listOrgOperators } from "@/lib/services/issues/list-org-operators";
import { listResolutionActions } from "@/lib/services/issues/list-resolution-actions";
import { listFieldTree } from "@/lib/services/wells/list-field-tree";
import { QueryProvider } from "@/components/query-provider";
import { IssueTable } from "@/components/issue-table";
import { IssueSparkline } from "@/components/issue-sparkline";
import { formatRisk } from "@/components/issue-format";
import { IssueFilters } from "./issue-filters";
import { SavedFilters } from "./saved-filters";
import { ResolutionActionsEditor } from "./resolution-actions-editor";

export const metadata: Metadata = { title: "Issues" };

function Tile({ label, children, testId }: { label: string; children: React.ReactNode; testId?: string }) {
  return (
    <div className="rounded border border-line bg-paper-raised p-3" data-testid={testId}>
      <div className="text-xs font-medium uppercase tracking-wide text-ink-soft">{label}</div>
      <div className="mt-1 text-lg font-semibold">{children}</div>
    </div>
  );
}

export default async function IssuesPage() {
  const actor = await requirePageActor("issues.read");
  if (actor.role === "operator") redirect("/my-work");
  const canTriage = can(actor.role, "issues.triage");
  const [summary, filters, fields, operators, actions] = await Promise.all([
    getIssueSummary(actor),
    listSavedFilters(actor),
    listFieldTree(actor),
    canTriage ? listOrgOperators(actor) : Promise.resolve([]),
    listResolutionActions(actor),
  ]);
  return (
    <div className="space-y-4">
      <h1 className="text-lg font-semibold">Issues, ranked by production at risk</h1>
      <section aria-label="Summary" className="grid grid-cols-2 gap-3 md:grid-cols-3 xl:grid-cols-6">
        <Tile label="Wells monitored" testId="tile-wells">{summary.wellsMonitored}</Tile>
        <Tile label="Wells with open issues" testId="tile-open-wells">
          {summary.wellsWithOpenIssues}
          <ul className="mt-1 text-xs font-normal text-ink-soft">
            {summary.wellsByRule.map((r) => <li key={r.rule}>{r.ruleLabel}: {r.wells}</li>)}
          </ul>
        </Tile>
        <Tile label="Production at risk" testId="tile-risk">
          {summary.productionAtRisk.length === 0 ? "0" : summary.productionAtRisk.map((r) => <div key={r.unit}>{formatRisk(r.value, r.unit)}</div>)}
        </Tile>
        <Tile label="Opened, last 7 days" testId="tile-opened">{summary.openedThisWeek}</Tile>
        <Tile label="Resolved, last 7 days" testId="tile-resolved">{summary.resolvedThisWeek}</Tile>
        <div className="col-span-2 rounded border border-line bg-paper-raised p-3 md:col-span-1 xl:col-span-1">
          <div className="text-xs font-medium uppercase tracking-wide text-ink-soft">Open issues, 30 days</div>
          <IssueSparkline points={summary.openPerDay} label="Open issues per day over the last 30 days" />
        </div>
      </section>
      <Suspense fallback={<p className="text-sm text-ink-soft">Loading the list…</p>}>
        <IssueFilters fields={fields} people={operators} />
        <SavedFilters filters={filters} />
        <QueryProvider>
          <IssueTable canTriage={canTriage} operators={operators} />
        </QueryProvider>
      </Suspense>
      {canTriage && <ResolutionActionsEditor actions={actions} />}
    </div>
  );
}
