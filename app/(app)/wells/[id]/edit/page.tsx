import type { Metadata } from "next";
import Link from "next/link";
import { requirePageActor } from "@/lib/auth/session";
import { listFieldTree } from "@/lib/services/wells/list-field-tree";
import { WellForm } from "../../well-form";
import { toWellFormValues } from "../../well-form-values";
import { loadWellOr404 } from "../../load-well";

export const metadata: Metadata = { title: "Edit well" };

export default async function EditWellPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor("wells.edit");
  const { id } = await params;
  const [well, tree] = await Promise.all([loadWellOr404(actor, id), listFieldTree(actor)]);
  return (
    <div className="space-y-4">
      <p className="text-xs text-ink-soft">
        <Link href="/wells" className="hover:text-ink">Wells</Link> / <Link href={`/wells/${well.id}`} className="hover:text-ink">{well.name}</Link>
      </p>
      <h1 className="text-lg font-semibold">Edit well</h1>
      <WellForm tree={tree} initial={toWellFormValues(well)} wellId={well.id} />
    </div>
  );
}
