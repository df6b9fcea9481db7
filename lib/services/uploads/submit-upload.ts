// Confirm how to read an upload and queue it for import.
//
// Wells: Bellows does not create placeholder wells from a file. A well key may be
// matched to a registered well of the organization; a key left unmatched (or sent
// as "create") is not imported: "create" is refused here with a message, and rows of
// unmatched wells are rejected as unknown_well by the worker and listed in the
// rejected-rows file.
//
// When Redis is down: the upload is kept as 'queued' (its row and mapping are
// committed first) and the answer carries a notice; the ingest worker re-enqueues
// uploads left 'queued' at start-up and every minute (requeueStuckUploads). Nothing
// is lost and the person need not send the file again.
import { Op } from "sequelize";
import { sequelize, Upload, Well } from "@/models";
import { pingRedis } from "@/lib/queue/connection";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { AppError, type FieldIssue } from "@/lib/errors";
import { parseOrThrow } from "@/lib/http";
import { saveMapping } from "@/lib/services/mappings/save-mapping";
import { SubmitUploadSchema, type SubmitUploadInput } from "@/lib/validations/uploads";
import { buildUploadView } from "./build-upload-view";
import { checkMappingColumns } from "./check-mapping-columns";
import { enqueueIngest } from "./enqueue-ingest";
import { withTimeout } from "./with-timeout";
import { findOwnUpload } from "./find-own-upload";
import { readStoredDetection, type UploadView } from "./upload-view";

const SUBMITTABLE = ["received", "queued", "failed"] as const;
const ENQUEUE_TIMEOUT_MS = 5000;


async function checkWellMatches(actor: Actor, matches: Record<string, number | "create">): Promise<{ ok: Record<string, number>; issues: FieldIssue[] }> {
  const issues: FieldIssue[] = [];
  const ok: Record<string, number> = {};
  const ids = [...new Set(Object.values(matches).filter((v): v is number => typeof v === "number"))];
  const found = new Set(
    (await Well.findAll({ where: { organization_id: actor.organizationId, id: { [Op.in]: ids } }, attributes: ["id"], raw: true })).map((w) => w.id),
  );
  for (const [key, v] of Object.entries(matches)) {
    if (v === "create") {
      issues.push({ path: `wellMatches.${key}`, message: `Bellows does not create wells from a file: add "${key}" to the well register first, or leave it unmatched (its rows will be rejected as unknown_well)` });
    } else if (!found.has(v)) {
      issues.push({ path: `wellMatches.${key}`, message: `well ${v} is not a well of your organization` });
    } else ok[key] = v;
  }
  return { ok, issues };
}

export async function submitUpload(actor: Actor, id: number, input: SubmitUploadInput): Promise<UploadView> {
  requireCapability(actor, "uploads.create");
  const data = parseOrThrow(SubmitUploadSchema, input);
  if (data.saveMappingAs) requireCapability(actor, "mappings.manage");
  const upload = await findOwnUpload(actor, id);
  const { detection, refusal } = readStoredDetection(upload);
  if (!detection) throw new AppError("invalid", `This file was not accepted${refusal ? `: ${refusal.message}` : ""}; it cannot be imported`);
  if (!(SUBMITTABLE as readonly string[]).includes(upload.status)) {
    throw new AppError("conflict", upload.status === "done" ? "This upload was already imported; send the file again to import it again" : "This upload is being imported now");
  }
  const issues = checkMappingColumns(data.mapping, detection.columns);
  const wells = await checkWellMatches(actor, data.wellMatches ?? {});
  issues.push(...wells.issues);
  if (issues.length > 0) throw new AppError("invalid", "The mapping does not fit this file", issues);

  await sequelize.transaction(async (transaction) => {
    const saved = data.saveMappingAs
      ? await saveMapping(actor, { name: data.saveMappingAs, mapping: data.mapping, headerShape: detection.headerShape }, { transaction })
      : null;
    // Conditional on the status so a worker that has just started cannot be overtaken.
    const [n] = await Upload.update(
      {
        mapping: data.mapping,
        mapping_id: saved?.id ?? upload.mapping_id,
        well_matches: wells.ok,
        status: "queued",
        error: null,
        progress: 0,
        bytes_processed: 0,
        counts: null,
        rejections_key: null,
        started_at: null,
        finished_at: null,
      },
      { where: { id: upload.id, status: { [Op.in]: [...SUBMITTABLE] } }, transaction },
    );
    if (n !== 1) throw new AppError("conflict", "This upload is being imported now");
  });
  await upload.reload();

  let notice: string | undefined;
  try {
    // A BullMQ queue waits for its connection to be ready, so bound the wait: a
    // request must not hang while Redis is away.
    await pingRedis();
    await withTimeout(enqueueIngest(upload.id, upload.organization_id), ENQUEUE_TIMEOUT_MS);
  } catch (e) {
    console.warn(`[submitUpload] upload ${upload.id} kept as queued; queue unreachable: ${(e as Error).message}`);
    notice = "The import queue cannot be reached right now. The upload is saved and will start by itself when the worker reconnects.";
  }
  const view = await buildUploadView(actor, upload);
  return notice ? { ...view, notice } : view;
}
