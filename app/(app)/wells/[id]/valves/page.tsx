import type { Metadata } from "next";
import Link from "next/link";
import { requirePageActor } from "@/lib/auth/session";
import { CautionNote } from "@/components/caution-note";
import { loadWellOr404 } from "../../load-well";
import { ValveStringForm, type MandrelRowValues } from "./valve-string-form";

export const metadata: Metadata = { title: "Edit valve string" };

const text = (v: number | null) => (v == null ? "" : String(v));

export default async function EditValvesPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor("wells.edit");
  const { id } = await params;
  const well = await loadWellOr404(actor, id);
  const initial: MandrelRowValues[] = [...well.mandrels]
    .sort((a, b) => a.position - b.position)
    .map((m) => ({
      position: m.position,
      mdFt: String(m.mdFt),
      tvdFt: String(m.tvdFt),
      kind: m.kind,
      portIn: text(m.portIn),
      valveOdIn: text(m.valveOdIn),
      rRatio: text(m.rRatio),
      tropsig: text(m.tropsig),
      installedOn: m.installedOn ?? "",
    }));
  return (
    <div className="space-y-4">
      <p className="text-xs text-ink-soft">
        <Link href="/wells" className="hover:text-ink">Wells</Link> / <Link href={`/wells/${well.id}`} className="hover:text-ink">{well.name}</Link>
      </p>
      <h1 className="text-lg font-semibold">Valve string of {well.name}</h1>
      <p className="text-sm text-ink-soft">
        One row per mandrel, top to bottom, in oilfield units. Unloading valves (ipo) need a port, a test-rack opening
        pressure at 60 °F, and a valve size or R; orifices need a port; dummies need depths only. Saving replaces the whole string.
      </p>
      <CautionNote compact />
      <ValveStringForm wellId={well.id} initial={initial} />
    </div>
  );
}
