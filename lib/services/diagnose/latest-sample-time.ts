// The newest stored value among some wells (epoch ms), or null: "the last N days"
// means the last N days of data, which for a demo or a backfilled field is not
// the last N days of the clock. One backward index probe per (well, signal): the
// newest hour block, whose last element is its newest time (blocks keep times ascending).
import { SIGNAL_CODE } from "@/lib/signals";
import { getSamplePool } from "@/lib/services/samples/sample-db";

const CODES = [SIGNAL_CODE.casing_pressure, SIGNAL_CODE.tubing_pressure, SIGNAL_CODE.injection_rate, SIGNAL_CODE.gas_rate, SIGNAL_CODE.liquid_rate];

export async function findLatestSampleTime(wellIds: number[]): Promise<number | null> {
  if (!wellIds.length) return null;
  const r = await getSamplePool().query<{ latest: Date | null }>(
    `SELECT max(x.t) AS latest
     FROM unnest($1::int[]) w(id) CROSS JOIN unnest($2::smallint[]) s(code)
     CROSS JOIN LATERAL (
       SELECT b.ts[cardinality(b.ts)] AS t FROM sample_blocks b WHERE b.well_id = w.id AND b.signal = s.code ORDER BY b.hour DESC LIMIT 1
     ) x`,
    [wellIds, CODES],
  );
  return r.rows[0]?.latest ? r.rows[0].latest.getTime() : null;
}
