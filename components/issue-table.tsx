"use client";
// The ranked issue list: TanStack Table (v8) with sorting, filters and paging
// done on the server (/api/issues) through TanStack Query. The URL holds the
// query so a view can be shared; selection feeds bulk acknowledge/assign.
import { useMemo, useState } from "react";
import Link from "next/link";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { keepPreviousData, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { createColumnHelper, flexRender, getCoreRowModel, useReactTable, type RowSelectionState, type SortingState } from "@tanstack/react-table";
import { ISSUE_QUERY_KEYS, type IssueSort } from "@/lib/validations/issues";
import { formatDuration, formatRisk, formatWhen, severityTone } from "./issue-format";
import { IssueStatusBadge } from "./issue-status-badge";
import type { IssueStatus } from "@/lib/validations/issues";

export interface IssueTableRow {
  id: number; wellId: number; wellName: string; fieldName: string; padName: string; rule: string; ruleLabel: string;
  severity: number; productionAtRisk: number; unit: string; since: string; durationHours: number; status: IssueStatus;
  assigneeId: number | null; assigneeName: string | null; lastChange: string;
}
interface ListResponse { rows: IssueTableRow[]; total: number; page: number; pageSize: number }
interface BulkResponse { results: { id: number; ok: boolean; message?: string }[]; okCount: number }

const col = createColumnHelper<IssueTableRow>();
const SORT_OF: Record<string, IssueSort> = { productionAtRisk: "risk", severity: "severity", since: "since", durationHours: "duration", wellName: "well", status: "status", lastChange: "lastChange" };

export function issueQueryString(sp: URLSearchParams): string {
  const out = new URLSearchParams();
  for (const k of ISSUE_QUERY_KEYS) {
    const v = sp.get(k);
    if (v) out.set(k, v);
  }
  return out.toString();
}

export function IssueTable({ canTriage, operators }: { canTriage: boolean; operators: { id: number; name: string }[] }) {
  const sp = useSearchParams();
  const router = useRouter();
  const pathname = usePathname();
  const qc = useQueryClient();
  const qs = issueQueryString(new URLSearchParams(sp.toString()));
  const [selection, setSelection] = useState<RowSelectionState>({});
  const [bulkMessage, setBulkMessage] = useState<string | null>(null);
  const [assignee, setAssignee] = useState<string>("");

  const { data, isFetching, error } = useQuery({
    queryKey: ["issues", qs],
    queryFn: async (): Promise<ListResponse> => {
      const res = await fetch(`/api/issues?${qs}`, { cache: "no-store" });
      const body = await res.json();
      if (!res.ok) throw new Error(body?.error?.message ?? "Could not load issues");
      return body as ListResponse;
    },
    placeholderData: keepPreviousData,
  });

  const setParams = (patch: Record<string, string | undefined>) => {
    const next = new URLSearchParams(sp.toString());
    for (const [k, v] of Object.entries(patch)) {
      if (v) next.set(k, v);
      else next.delete(k);
    }
    router.replace(`${pathname}?${issueQueryString(next)}`, { scroll: false });
    setSelection({});
  };

  const sort = (sp.get("sort") as IssueSort | null) ?? "risk";
  const dir = sp.get("dir") === "asc" ? "asc" : "desc";
  const sorting: SortingState = useMemo(() => {
    const id = Object.entries(SORT_OF).find(([, s]) => s === sort)?.[0] ?? "productionAtRisk";
    return [{ id, desc: dir === "desc" }];
  }, [sort, dir]);

  const columns = useMemo(() => [
    ...(canTriage ? [col.display({
      id: "select",
      header: ({ table }) => (
        <input type="checkbox" aria-label="Select all issues on this page" checked={table.getIsAllRowsSelected()} onChange={table.getToggleAllRowsSelectedHandler()} className="h-4 w-4" />
      ),
      cell: ({ row }) => (
        <input type="checkbox" aria-label={`Select issue ${row.original.id} on ${row.original.wellName}`} checked={row.getIsSelected()} onChange={row.getToggleSelectedHandler()} className="h-4 w-4" />
      ),
    })] : []),
    col.accessor("wellName", { header: "Well", cell: (c) => <Link href={`/issues/${c.row.original.id}`} className="font-medium text-copper-dark underline-offset-2 hover:underline">{c.getValue()}</Link> }),
    col.accessor((r) => `${r.fieldName} / ${r.padName}`, { id: "fieldPad", header: "Field / pad", enableSorting: false }),
    col.accessor("ruleLabel", { header: "Issue type", enableSorting: false }),
    col.accessor("severity", { header: "Severity", cell: (c) => <span className={`rounded px-1.5 py-0.5 text-xs font-semibold ${severityTone(c.getValue())}`}>{c.getValue()}</span> }),
    col.accessor("productionAtRisk", { header: "Production at risk", cell: (c) => formatRisk(c.getValue(), c.row.original.unit) }),
    col.accessor("since", { header: "Since", cell: (c) => formatWhen(c.getValue()) }),
    col.accessor("durationHours", { header: "Duration", cell: (c) => formatDuration(c.getValue()) }),
    col.accessor("status", { header: "Status", cell: (c) => <IssueStatusBadge status={c.getValue()} /> }),
    col.accessor("assigneeName", { header: "Assignee", enableSorting: false, cell: (c) => c.getValue() ?? <span className="text-ink-faint">—</span> }),
    col.accessor("lastChange", { header: "Last change", cell: (c) => formatWhen(c.getValue()) }),
  ], [canTriage]);

  // eslint-disable-next-line react-hooks/incompatible-library -- TanStack Table v8 is the chosen table; this component is not memoized by the compiler
  const table = useReactTable({
    data: data?.rows ?? [],
    columns,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (r) => String(r.id),
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    enableRowSelection: canTriage,
    rowCount: data?.total ?? 0,
    state: { sorting, rowSelection: selection, pagination: { pageIndex: (data?.page ?? 1) - 1, pageSize: data?.pageSize ?? 50 } },
    onRowSelectionChange: setSelection,
    onSortingChange: (updater) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      const s = next[0];
      if (!s) return setParams({ sort: undefined, dir: undefined, page: undefined });
      setParams({ sort: SORT_OF[s.id] ?? "risk", dir: s.desc ? "desc" : "asc", page: undefined });
    },
  });

  const bulk = useMutation({
    mutationFn: async (input: { kind: "acknowledge" | "assign"; assigneeId?: number }): Promise<BulkResponse> => {
      const res = await fetch("/api/issues/bulk", { method: "POST", headers: { "Content-Type": "application/json" }, body: JSON.stringify({ ids: Object.keys(selection).map(Number), ...input }) });
      const body = await res.json();
      if (!res.ok) throw new Error(body?.error?.message ?? "Bulk change failed");
      return body as BulkResponse;
    },
    onSuccess: (r) => {
      const failed = r.results.filter((x) => !x.ok);
      setBulkMessage(`${r.okCount} changed${failed.length ? `; ${failed.length} not changed: ${failed.map((f) => `#${f.id} ${f.message}`).join("; ")}` : ""}`);
      setSelection({});
      void qc.invalidateQueries({ queryKey: ["issues"] });
      router.refresh(); // the summary tiles are rendered on the server
    },
    onError: (e: Error) => setBulkMessage(e.message),
  });

  const selectedCount = Object.keys(selection).length;
  const total = data?.total ?? 0;
  const page = data?.page ?? 1;
  const pageSize = data?.pageSize ?? 50;
  const pages = Math.max(1, Math.ceil(total / pageSize));

  return (
    <div className="space-y-2">
      <div className="flex flex-wrap items-center gap-3 text-sm">
        <span data-testid="issue-total">{total.toLocaleString("en-US")} {total === 1 ? "issue" : "issues"}</span>
        {isFetching && <span className="text-xs text-ink-faint" role="status">Loading…</span>}
        <a href={`/api/issues/export.csv?${qs}`} className="ml-auto rounded border border-line bg-paper-raised px-3 py-1.5 hover:border-ink-faint" download>
          Export CSV
        </a>
      </div>
      {canTriage && (
        <div className="flex flex-wrap items-end gap-2 rounded border border-line bg-paper-sunk/60 p-2 text-sm" aria-label="Bulk triage">
          <span className="py-1.5">{selectedCount} selected</span>
          <button type="button" disabled={!selectedCount || bulk.isPending} onClick={() => bulk.mutate({ kind: "acknowledge" })} className="rounded border border-line bg-paper-raised px-3 py-1.5 disabled:opacity-50">
            Acknowledge selected
          </button>
          <label className="sr-only" htmlFor="bulk-assignee">Operator for the selected issues</label>
          <div className="w-56"><select id="bulk-assignee" value={assignee} onChange={(e) => setAssignee(e.target.value)} className="field-input">
            <option value="">Choose operator…</option>
            {operators.map((o) => <option key={o.id} value={o.id}>{o.name}</option>)}
          </select></div>
          <button type="button" disabled={!selectedCount || !assignee || bulk.isPending} onClick={() => bulk.mutate({ kind: "assign", assigneeId: Number(assignee) })} className="rounded bg-ink px-3 py-1.5 font-medium text-paper disabled:opacity-50">
            Assign selected
          </button>
          {bulkMessage && <span role="status" className="text-xs text-ink-soft">{bulkMessage}</span>}
        </div>
      )}
      {error && <p role="alert" className="text-sm text-bad">{(error as Error).message}</p>}
      <div className="overflow-x-auto rounded border border-line bg-paper-raised">
        <table className="data-table w-full" aria-label="Ranked issues">
          <thead>
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id}>
                {hg.headers.map((h) => {
                  const s = h.column.getIsSorted();
                  return (
                    <th key={h.id} scope="col" aria-sort={s ? (s === "asc" ? "ascending" : "descending") : undefined}>
                      {h.column.getCanSort() ? (
                        <button type="button" onClick={h.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 uppercase hover:text-ink">
                          {flexRender(h.column.columnDef.header, h.getContext())}
                          <span aria-hidden="true" className="text-[10px]">{s === "asc" ? "▲" : s === "desc" ? "▼" : "↕"}</span>
                        </button>
                      ) : flexRender(h.column.columnDef.header, h.getContext())}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((r) => (
              <tr key={r.id} data-testid="issue-row" data-rule={r.original.rule}>
                {r.getVisibleCells().map((c) => <td key={c.id}>{flexRender(c.column.columnDef.cell, c.getContext())}</td>)}
              </tr>
            ))}
            {data && data.rows.length === 0 && (
              <tr><td colSpan={columns.length} className="py-6 text-center text-ink-soft">No issues match these filters.</td></tr>
            )}
          </tbody>
        </table>
      </div>
      <nav aria-label="Pages" className="flex items-center gap-2 text-sm">
        <button type="button" disabled={page <= 1} onClick={() => setParams({ page: String(page - 1) })} className="rounded border border-line px-2 py-1 disabled:opacity-40">Previous</button>
        <span>Page {page} of {pages}</span>
        <button type="button" disabled={page >= pages} onClick={() => setParams({ page: String(page + 1) })} className="rounded border border-line px-2 py-1 disabled:opacity-40">Next</button>
      </nav>
    </div>
  );
}
