// The JSON sample batch of POST /api/v1/samples.
import { z } from "zod";
import { SIGNALS } from "@/lib/signals";
import { UNITS } from "@/lib/units/units";

export const MAX_SAMPLES_PER_CALL = 10_000;
const ALL_UNITS = [...new Set(Object.values(UNITS).flat())] as [string, ...string[]];

export const SampleItemSchema = z.object({
  /** The well's UWI or its name in the register. */
  well: z.string().trim().min(1).max(120),
  signal: z.enum(SIGNALS),
  /** ISO 8601 with an offset or Z, or epoch milliseconds. */
  t: z.union([z.iso.datetime({ offset: true }), z.number().int().min(0).max(8.64e15)]),
  v: z.number().refine(Number.isFinite, "must be a finite number"),
  /** Unit of v; the signal's canonical unit (psig, Mscf/d, bbl/d, degF) when left out. */
  unit: z.enum(ALL_UNITS).optional(),
});
export type SampleItem = z.infer<typeof SampleItemSchema>;

/** Items are checked one by one by the service so one bad item does not refuse the batch. */
export const SamplesBatchSchema = z.object({
  samples: z.array(z.unknown()).min(1, "send at least one sample").max(MAX_SAMPLES_PER_CALL, `at most ${MAX_SAMPLES_PER_CALL} samples per call`),
});
