import { DiagnoseRun } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { notFound } from "@/lib/errors";
import { toDiagnoseRunView, type DiagnoseRunView } from "./diagnose-run-view";

/** One diagnose run of the actor's organization (404 for another's). */
export async function getDiagnoseRun(actor: Actor, id: number): Promise<DiagnoseRunView> {
  requireCapability(actor, "issues.read");
  if (!Number.isInteger(id) || id <= 0) throw notFound("Diagnose run not found");
  const run = await DiagnoseRun.findOne({ where: { id, organization_id: actor.organizationId } });
  if (!run) throw notFound("Diagnose run not found");
  return toDiagnoseRunView(run);
}
