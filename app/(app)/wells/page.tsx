import type { Metadata } from "next";
import Link from "next/link";
import { requirePageActor } from "@/lib/auth/session";
import { can } from "@/lib/auth/roles";
import { listWells } from "@/lib/services/wells/list-wells";
import { listFieldTree } from "@/lib/services/wells/list-field-tree";
import { WELL_STATUSES, WELL_STATUS_LABEL } from "@/lib/validations/well";
import { WellStatusBadge } from "@/components/well-status-badge";
import { formatUpdated } from "@/components/well-units";
import { readWellFilter, wellListHref, type RawSearchParams } from "./list-params";
import { SortHeader } from "./sort-header";

export const metadata: Metadata = { title: "Wells" };

export default async function WellsPage({ searchParams }: { searchParams: Promise<RawSearchParams> }) {
  const actor = await requirePageActor("wells.read");
  const { filter, ignored } = readWellFilter(await searchParams);
  const [wells, tree] = await Promise.all([listWells(actor, filter), listFieldTree(actor)]);
  const canEdit = can(actor.role, "wells.edit");
  const isFiltered = Boolean(filter.q || filter.fieldId || filter.padId || filter.status);

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-lg font-semibold">Wells</h1>
        <span className="text-sm text-ink-soft" data-testid="well-count">{wells.length} {wells.length === 1 ? "well" : "wells"}</span>
        {canEdit && (
          <div className="ml-auto flex gap-2">
            <Link href="/wells/import" className="rounded border border-line bg-paper-raised px-3 py-1.5 text-sm hover:border-ink-faint">
              Import from CSV
            </Link>
            <Link href="/wells/new" className="rounded bg-ink px-3 py-1.5 text-sm font-medium text-paper hover:bg-ink/90">
              Add well
            </Link>
          </div>
        )}
      </div>

      {/* A plain GET form: filtering works without client script and the URL can be shared. */}
      <form method="get" action="/wells" role="search" aria-label="Filter wells" className="flex flex-wrap items-end gap-3 rounded border border-line bg-paper-raised p-3">
        <div className="min-w-48 flex-1">
          <label htmlFor="q" className="field-label">Search name or identifier</label>
          <input id="q" name="q" type="search" defaultValue={filter.q ?? ""} className="field-input" />
        </div>
        <div>
          <label htmlFor="fieldId" className="field-label">Field</label>
          <select id="fieldId" name="fieldId" defaultValue={filter.fieldId ?? ""} className="field-input">
            <option value="">All fields</option>
            {tree.map((f) => <option key={f.id} value={f.id}>{f.name}</option>)}
          </select>
        </div>
        <div>
          <label htmlFor="padId" className="field-label">Pad</label>
          <select id="padId" name="padId" defaultValue={filter.padId ?? ""} className="field-input">
            <option value="">All pads</option>
            {tree.map((f) => (
              <optgroup key={f.id} label={f.name}>
                {f.pads.map((p) => <option key={p.id} value={p.id}>{p.name}</option>)}
              </optgroup>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor="status" className="field-label">Status</label>
          <select id="status" name="status" defaultValue={filter.status ?? ""} className="field-input">
            <option value="">Any status</option>
            {WELL_STATUSES.map((s) => <option key={s} value={s}>{WELL_STATUS_LABEL[s]}</option>)}
          </select>
        </div>
        {filter.sort !== "name" && <input type="hidden" name="sort" value={filter.sort} />}
        {filter.dir !== "asc" && <input type="hidden" name="dir" value={filter.dir} />}
        <button type="submit" className="rounded bg-ink px-3 py-1.5 text-sm font-medium text-paper hover:bg-ink/90">Apply</button>
        {isFiltered && (
          <Link href={wellListHref({ sort: filter.sort, dir: filter.dir })} className="py-1.5 text-sm text-copper-dark underline">
            Clear filters
          </Link>
        )}
      </form>

      {ignored.length > 0 && (
        <p className="rounded bg-warn/10 px-2 py-1 text-sm" role="status">
          Some filter values were not understood and were ignored ({ignored.join(", ")}).
        </p>
      )}

      {wells.length === 0 ? (
        <div className="rounded border border-dashed border-line p-6 text-center text-sm text-ink-soft">
          {isFiltered ? "No well matches these filters." : "The register is empty."}
          {canEdit && !isFiltered && (
            <> Add a well by hand or <Link href="/wells/import" className="text-copper-dark underline">import a CSV file</Link>.</>
          )}
        </div>
      ) : (
        <div className="overflow-x-auto rounded border border-line bg-paper-raised">
          <table className="data-table w-full" data-testid="well-table">
            <caption className="sr-only">Wells in the register</caption>
            <thead>
              <tr>
                <SortHeader label="Name" sortKey="name" filter={filter} />
                <SortHeader label="Identifier" sortKey="uwi" filter={filter} />
                <SortHeader label="Field" sortKey="field" filter={filter} />
                <SortHeader label="Pad" sortKey="pad" filter={filter} />
                <SortHeader label="Status" sortKey="status" filter={filter} />
                <th scope="col" className="text-right">Mandrels</th>
                <SortHeader label="Last change" sortKey="updated" filter={filter} />
              </tr>
            </thead>
            <tbody>
              {wells.map((w) => (
                <tr key={w.id} data-testid="well-row">
                  <td><Link href={`/wells/${w.id}`} className="font-medium text-copper-dark hover:underline">{w.name}</Link></td>
                  <td className="font-mono text-xs">{w.uwi}</td>
                  <td>{w.fieldName}</td>
                  <td>{w.padName}</td>
                  <td><WellStatusBadge status={w.status} /></td>
                  <td className="text-right tabular-nums">{w.mandrelCount}</td>
                  <td className="whitespace-nowrap text-ink-soft">{formatUpdated(w.updatedAt)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
