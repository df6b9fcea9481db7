import type { Metadata } from "next";
import Link from "next/link";
import { requirePageActor } from "@/lib/auth/session";
import { can } from "@/lib/auth/roles";
import { getOrgContext } from "@/lib/services/org/get-org-context";
import { pressureToPsig, psigTo, type UnitSystem } from "@/lib/units/units";
import { CautionNote } from "@/components/caution-note";
import { TrendChartSection } from "@/components/trend-chart-section";
import { WellStatusBadge } from "@/components/well-status-badge";
import { formatUpdated } from "@/components/well-units";
import { CompletionData } from "./completion-data";
import { MandrelTable } from "./mandrel-table";
import { DesignPressures } from "./design-pressures";
import { loadWellOr404 } from "../load-well";

export const metadata: Metadata = { title: "Well" };

/** A typical surface tubing pressure for the design table, psig (our default; the reader can change it). */
const DEFAULT_TUBING_PSIG = 150;
const MAX_TUBING_PSIG = 5000;

/** ?tp= is read in the reader's pressure unit; out-of-range or non-numbers fall back to the default. */
function readTubingPressure(raw: string | string[] | undefined, system: UnitSystem) {
  const unit = system === "metric" ? "kPag" : "psig";
  const text = Array.isArray(raw) ? raw[0] : raw;
  const fallback = { psig: DEFAULT_TUBING_PSIG, input: String(Math.round(psigTo(DEFAULT_TUBING_PSIG, unit))) };
  if (text === undefined || text.trim() === "") return { ...fallback, isIgnored: false };
  const psig = pressureToPsig(Number(text), unit);
  if (!Number.isFinite(psig) || psig < 0 || psig > MAX_TUBING_PSIG) return { ...fallback, isIgnored: true };
  return { psig, input: text.trim(), isIgnored: false };
}

export default async function WellPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const actor = await requirePageActor("wells.read");
  const [{ id }, sp] = await Promise.all([params, searchParams]);
  const [well, ctx] = await Promise.all([loadWellOr404(actor, id), getOrgContext(actor)]);
  const system = ctx.unitSystem;
  const canEdit = can(actor.role, "wells.edit");
  const tp = readTubingPressure(sp.tp, system);

  return (
    <div className="space-y-6">
      <div>
        <p className="text-xs text-ink-soft">
          <Link href="/wells" className="hover:text-ink">Wells</Link> / {well.fieldName} / {well.padName}
        </p>
        <div className="mt-1 flex flex-wrap items-center gap-3">
          <h1 className="text-lg font-semibold" data-testid="well-name">{well.name}</h1>
          <span className="font-mono text-sm text-ink-soft" data-testid="well-uwi">{well.uwi}</span>
          <WellStatusBadge status={well.status} />
          {canEdit && (
            <div className="ml-auto flex gap-2">
              <Link href={`/wells/${well.id}/edit`} className="rounded border border-line bg-paper-raised px-3 py-1.5 text-sm hover:border-ink-faint">
                Edit well
              </Link>
              <Link href={`/wells/${well.id}/valves`} className="rounded border border-line bg-paper-raised px-3 py-1.5 text-sm hover:border-ink-faint">
                Edit valves
              </Link>
            </div>
          )}
        </div>
        <p className="mt-1 text-xs text-ink-faint">Last change {formatUpdated(well.updatedAt)}</p>
      </div>

      <section aria-labelledby="completion-heading" className="space-y-2">
        <h2 id="completion-heading" className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Completion</h2>
        <CompletionData well={well} system={system} />
      </section>

      <TrendChartSection wellId={well.id} timeZone={well.timeZone} unitSystem={system} range={sp.range} />

      <section aria-labelledby="valves-heading" className="space-y-2">
        <h2 id="valves-heading" className="text-sm font-semibold uppercase tracking-wide text-ink-soft">
          Valve string <span className="font-normal normal-case">({well.mandrelCount} {well.mandrelCount === 1 ? "mandrel" : "mandrels"}, top to bottom)</span>
        </h2>
        <MandrelTable mandrels={well.mandrels} system={system} />
      </section>

      <section aria-labelledby="design-heading" className="space-y-2">
        <h2 id="design-heading" className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Design surface pressures</h2>
        <CautionNote compact />
        <DesignPressures well={well} system={system} tubingPsig={tp.psig} tpInput={tp.input} isTpIgnored={tp.isIgnored} />
      </section>
    </div>
  );
}
