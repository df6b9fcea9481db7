// Invented trend data for the chart tests: 1-minute casing, tubing, injection and
// produced gas, hourly liquid, with one single-minute casing spike and one tubing
// dip to find again in the reduced answer. Values are made up (not from any well).
import type pg from "pg";
import { SIGNAL_CODE, type Signal } from "@/lib/signals";
import type { ValueColumns } from "@/lib/ingest/value-buffer";
import { openSampleClient } from "@/lib/services/samples/sample-db";
import { writeSampleBatch } from "@/lib/services/samples/write-sample-batch";
import { refreshHourlyRollup } from "@/lib/services/samples/refresh-hourly-rollup";

export const MINUTE = 60_000;
export const DAY = 1440 * MINUTE;

export interface TrendFixture {
  start: number;
  days: number;
  spikeAt: number;
  spikeValue: number;
  dipAt: number;
  dipValue: number;
}

export function makeFixture(start: number, days: number): TrendFixture {
  const mid = start + Math.floor(days / 2) * DAY;
  return { start, days, spikeAt: mid + 12 * 60 * MINUTE + 7 * MINUTE, spikeValue: 1400, dipAt: mid + 15 * 60 * MINUTE + 3 * MINUTE, dipValue: 40 };
}

/** The value of a signal at minute i (deterministic, no random numbers). */
export function valueAt(f: TrendFixture, signal: Signal, t: number): number {
  const i = (t - f.start) / MINUTE;
  switch (signal) {
    case "casing_pressure": return t === f.spikeAt ? f.spikeValue : 960 + 5 * Math.sin((2 * Math.PI * i) / 47);
    // Tubing heads with a 90-minute period around 150 psig.
    case "tubing_pressure": return t === f.dipAt ? f.dipValue : 150 + 20 * Math.sin((2 * Math.PI * i) / 90);
    case "injection_rate": return 600 + 10 * Math.sin((2 * Math.PI * i) / 300);
    case "gas_rate": return 900 + 40 * Math.sin((2 * Math.PI * i) / 90);
    default: return 400 + 15 * Math.sin((2 * Math.PI * i) / 1440);
  }
}

const MINUTE_SIGNALS: Signal[] = ["casing_pressure", "tubing_pressure", "injection_rate", "gas_rate"];

/**
 * The hourly rollup of the five signals over [fromMs, toMs). Repeating it is harmless
 * (it recomputes), so it stays correct once the writer refreshes the hourly rollup itself.
 */
export async function refreshHourlyRollupOf(client: pg.ClientBase, wellId: number, fromMs: number, toMs: number): Promise<void> {
  const codes = [...MINUTE_SIGNALS, "liquid_rate" as const].map((s) => SIGNAL_CODE[s]);
  await refreshHourlyRollup(client, {
    wellIds: codes.map(() => wellId),
    signals: codes,
    los: codes.map(() => new Date(fromMs)),
    his: codes.map(() => new Date(toMs)),
  });
}

/** Write the fixture for one well through the ingest writer (samples and rollup). */
export async function writeFixture(wellId: number, f: TrendFixture): Promise<number> {
  const client = await openSampleClient();
  let total = 0;
  try {
    // Ten days per batch: the writer's cost is mostly per batch.
    const DAYS_PER_BATCH = 10;
    const perBatch = (4 * 1440 + 24) * DAYS_PER_BATCH;
    for (let d0 = 0; d0 < f.days; d0 += DAYS_PER_BATCH) {
      const wellIds: number[] = [];
      const b: ValueColumns<number> = { length: 0, wellId: wellIds, signal: new Uint8Array(perBatch), t: new Float64Array(perBatch), v: new Float64Array(perBatch) };
      const push = (signal: Signal, t: number) => {
        wellIds.push(wellId);
        b.signal[b.length] = SIGNAL_CODE[signal];
        b.t[b.length] = t;
        b.v[b.length] = valueAt(f, signal, t);
        b.length++;
      };
      for (let d = d0; d < Math.min(f.days, d0 + DAYS_PER_BATCH); d++) {
        const day0 = f.start + d * DAY;
        for (const s of MINUTE_SIGNALS) for (let m = 0; m < 1440; m++) push(s, day0 + m * MINUTE);
        for (let h = 0; h < 24; h++) push("liquid_rate", day0 + h * 60 * MINUTE);
      }
      total += b.length;
      await writeSampleBatch(client, b);
      await refreshHourlyRollupOf(client, wellId, f.start + d0 * DAY, f.start + Math.min(f.days, d0 + DAYS_PER_BATCH) * DAY);
    }
  } finally {
    await client.end();
  }
  return total;
}
