import type { Metadata } from "next";
import { requirePageActor } from "@/lib/auth/session";
import { listFieldTree } from "@/lib/services/wells/list-field-tree";
import { WellForm } from "../well-form";

export const metadata: Metadata = { title: "Add well" };

export default async function NewWellPage() {
  const actor = await requirePageActor("wells.edit");
  const tree = await listFieldTree(actor);
  return (
    <div className="space-y-4">
      <h1 className="text-lg font-semibold">Add well</h1>
      <WellForm tree={tree} initial={{}} />
    </div>
  );
}
