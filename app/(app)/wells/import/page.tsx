import type { Metadata } from "next";
import Link from "next/link";
import { requirePageActor } from "@/lib/auth/session";
import { VALVE_CSV_COLUMNS, WELL_CSV_COLUMNS } from "@/lib/validations/register-csv";
import { ImportForm } from "./import-form";

export const metadata: Metadata = { title: "Import wells" };

export default async function ImportPage() {
  await requirePageActor("wells.edit");
  return (
    <div className="space-y-4">
      <p className="text-xs text-ink-soft"><Link href="/wells" className="hover:text-ink">Wells</Link> / Import</p>
      <h1 className="text-lg font-semibold">Import from CSV</h1>
      <div className="grid gap-3 text-sm sm:grid-cols-2">
        <div className="rounded border border-line bg-paper-raised p-3">
          <h2 className="font-semibold">Well list</h2>
          <p className="mt-1 text-xs text-ink-soft">One row per well. Fields and pads named in the file are created when missing. Columns:</p>
          <p className="mt-1 break-words font-mono text-xs">{WELL_CSV_COLUMNS.join(", ")}</p>
          <a href="/templates/wells-template.csv" download className="mt-2 inline-block text-copper-dark underline">Download the well list template</a>
        </div>
        <div className="rounded border border-line bg-paper-raised p-3">
          <h2 className="font-semibold">Valve design</h2>
          <p className="mt-1 text-xs text-ink-soft">
            One row per mandrel, positions 1, 2, 3… top to bottom; a well&apos;s rows replace its whole valve string. Kind is ipo, orifice or dummy. Columns:
          </p>
          <p className="mt-1 break-words font-mono text-xs">{VALVE_CSV_COLUMNS.join(", ")}</p>
          <a href="/templates/valves-template.csv" download className="mt-2 inline-block text-copper-dark underline">Download the valve design template</a>
        </div>
      </div>
      <p className="text-xs text-ink-soft">Values are in oilfield units (in, ft, °F, psig). Dates are YYYY-MM-DD.</p>
      <ImportForm />
    </div>
  );
}
