// A person asks for the diagnosis of one well, one field or (neither) the whole
// organization: a diagnose_runs row the page can poll, and a queued job that reports
// progress on it (job id "run-<id>", so a double submit cannot queue it twice).
import { z } from "zod";
import { DiagnoseRun, Field, Well } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { AppError, notFound } from "@/lib/errors";
import { parseOrThrow } from "@/lib/http";
import { QUEUES } from "@/lib/queue/jobs";
import { getQueue } from "@/lib/queue/queues";
import { DiagnoseRunJobSchema } from "./diagnose-run-job";
import { toDiagnoseRunView, type DiagnoseRunView } from "./diagnose-run-view";

export const RequestDiagnosisSchema = z
  .object({
    wellId: z.coerce.number().int().positive().optional(),
    fieldId: z.coerce.number().int().positive().optional(),
  })
  .refine((v) => !(v.wellId && v.fieldId), { message: "Choose a well or a field, not both" });

export async function requestDiagnosis(actor: Actor, input: unknown): Promise<DiagnoseRunView> {
  requireCapability(actor, "diagnose.run");
  const { wellId, fieldId } = parseOrThrow(RequestDiagnosisSchema, input);
  if (wellId && !(await Well.count({ where: { id: wellId, organization_id: actor.organizationId } }))) throw notFound("Well not found");
  if (fieldId && !(await Field.count({ where: { id: fieldId, organization_id: actor.organizationId } }))) throw notFound("Field not found");
  const scope = wellId ? { wellId } : fieldId ? { fieldId } : {};
  const run = await DiagnoseRun.create({ organization_id: actor.organizationId, requested_by: actor.userId, reason: "manual", scope, status: "queued" });
  const data = DiagnoseRunJobSchema.parse({
    v: 1,
    organizationId: actor.organizationId,
    wellIds: wellId ? [wellId] : undefined,
    fieldId,
    reason: "manual",
    requestedBy: actor.userId,
    runId: run.id,
  });
  try {
    await getQueue(QUEUES.diagnose).add("diagnose", data, { jobId: `run-${run.id}` });
  } catch {
    await run.update({ status: "failed", error: "The job queue is not reachable", finished_at: new Date() });
    throw new AppError("unavailable", "The diagnosis could not be queued right now; try again in a minute");
  }
  return toDiagnoseRunView(run);
}
