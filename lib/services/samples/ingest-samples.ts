// POST /api/v1/samples: a JSON batch of values written through the same bulk
// upsert as file imports. Each item is checked on its own: bad items come back
// with their index and reason, good ones are stored. Units are converted to the
// canonical unit of the signal's quantity (lib/units/units.ts).
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { AppError } from "@/lib/errors";
import { parseOrThrow } from "@/lib/http";
import { isInRange, describeOutOfRange } from "@/lib/ingest/parse-value";
import { ValueBuffer } from "@/lib/ingest/value-buffer";
import { DiagnoseJobSchema, QUEUES } from "@/lib/queue/jobs";
import { getQueue } from "@/lib/queue/queues";
import { pingRedis } from "@/lib/queue/connection";
import { withTimeout } from "@/lib/services/uploads/with-timeout";
import { SIGNAL_CODE, SIGNAL_QUANTITY } from "@/lib/signals";
import { CANONICAL_UNIT, isUnitOf, toCanonical } from "@/lib/units/units";
import { SampleItemSchema, SamplesBatchSchema } from "@/lib/validations/samples";
import { loadWellIndex } from "@/lib/services/uploads/well-index";
import { getSamplePool } from "./sample-db";
import { writeSampleBatch } from "./write-sample-batch";

export interface SampleItemError {
  index: number;
  path: string;
  message: string;
}

export interface IngestSamplesResult {
  received: number;
  valuesStored: number;
  /** Items repeating an earlier (well, signal, t) of the batch, plus values already stored identically. */
  duplicatesMerged: number;
  rejected: number;
  errors: SampleItemError[];
  /** False when the diagnosis could not be queued (the values are stored all the same). */
  isDiagnoseQueued: boolean;
}

export async function ingestSamples(actor: Actor, input: unknown): Promise<IngestSamplesResult> {
  requireCapability(actor, "uploads.create");
  const { samples } = parseOrThrow(SamplesBatchSchema, input);
  const wells = await loadWellIndex(actor.organizationId);
  const buffer = new ValueBuffer<number>();
  const errors: SampleItemError[] = [];
  const series = new Map<string, number>();
  let lo = Infinity;
  let hi = -Infinity;
  const wellIds = new Set<number>();

  samples.forEach((raw, index) => {
    const r = SampleItemSchema.safeParse(raw);
    if (!r.success) {
      for (const i of r.error.issues) errors.push({ index, path: i.path.join("."), message: i.message });
      return;
    }
    const s = r.data;
    const wellId = wells.resolve(s.well);
    if (wellId === undefined) return void errors.push({ index, path: "well", message: `"${s.well}" is not the UWI or name of a well of your organization` });
    const quantity = SIGNAL_QUANTITY[s.signal];
    const unit = s.unit ?? CANONICAL_UNIT[quantity];
    if (!isUnitOf(quantity, unit)) return void errors.push({ index, path: "unit", message: `"${unit}" is not a ${quantity.replace("_", " ")} unit` });
    const v = toCanonical(quantity, s.v, unit);
    if (!isInRange(quantity, v)) return void errors.push({ index, path: "v", message: describeOutOfRange(quantity, v) });
    const t = typeof s.t === "number" ? s.t : Date.parse(s.t);
    const key = `${wellId}:${s.signal}`;
    let id = series.get(key);
    if (id === undefined) series.set(key, (id = series.size));
    buffer.add(id, wellId, SIGNAL_CODE[s.signal], t, v);
    lo = Math.min(lo, t);
    hi = Math.max(hi, t);
    wellIds.add(wellId);
  });

  const values = buffer.take();
  const inBatchDuplicates = values.duplicates;
  if (values.length === 0 && errors.length > 0) throw new AppError("invalid", "No sample in the batch could be stored", errors.slice(0, 1000).map((e) => ({ path: `samples.${e.index}.${e.path}`, message: e.message })));

  const client = await getSamplePool().connect();
  let result;
  try {
    result = await writeSampleBatch(client, values);
  } finally {
    client.release();
  }

  let isDiagnoseQueued = false;
  if (result.written > 0) {
    try {
      await pingRedis();
      await withTimeout(getQueue(QUEUES.diagnose).add(
        "diagnose",
        DiagnoseJobSchema.parse({ v: 1, organizationId: actor.organizationId, wellIds: [...wellIds], from: lo, to: hi, reason: "ingest", requestedBy: actor.userId }),
      ), 5000);
      isDiagnoseQueued = true;
    } catch (e) {
      console.warn(`[ingestSamples] diagnose not queued: ${(e as Error).message}`);
    }
  }
  return {
    received: samples.length,
    valuesStored: result.written,
    duplicatesMerged: inBatchDuplicates + result.unchanged,
    rejected: samples.length - (result.written + result.unchanged + inBatchDuplicates),
    errors: errors.slice(0, 1000),
    isDiagnoseQueued,
  };
}
