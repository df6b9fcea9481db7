// The "current" operating state a chart's valve lines are read at: medians of the
// last RECENT_WINDOW of casing and tubing pressure and injection rate before the end
// of the shown range. A median over hours steadies the reading through heading
// cycles and single bad values (our choice; the window is short enough to follow
// a setpoint change within the same shift).
import type pg from "pg";
import { SIGNAL_CODE } from "@/lib/signals";

/** The hour blocks (bins from 2000-01-01 UTC) that can hold times in [lo, hi]. */
const hoursOf = (lo: string, hi: string) => `hour >= date_bin('1 hour', ${lo}::timestamptz, timestamptz '2000-01-01Z') AND hour <= ${hi}`;

export const RECENT_WINDOW_MS = 6 * 3600_000;
/** The signals the medians are read from. */
export const RECENT_MEDIAN_CODES: readonly number[] = [SIGNAL_CODE.casing_pressure, SIGNAL_CODE.tubing_pressure, SIGNAL_CODE.injection_rate];
/** How far before the range start we still look for the latest values. */
const LOOK_BACK_MS = 7 * 86_400_000;

export interface RecentMedians {
  casingPsig: number | null;
  tubingPsig: number | null;
  injectionMscfd: number | null;
  /** Time of the latest pressure value used, epoch ms; null when there was none. */
  windowEnd: number | null;
}

// Two short queries rather than one: with the window's end known up front, the
// median read is a plain prefix-plus-range on the primary key. (Joined to the
// latest-time lookup, PostgreSQL cannot use the runtime bound in the index and read
// every value of the well: ~0.9 s against ~5 ms measured on 90 days of 1-minute data.)
export async function readRecentMedians(db: pg.Pool | pg.ClientBase, wellId: number, fromMs: number, toMs: number): Promise<RecentMedians> {
  const casing = SIGNAL_CODE.casing_pressure;
  const tubing = SIGNAL_CODE.tubing_pressure;
  const injection = SIGNAL_CODE.injection_rate;
  // Latest pressure value per signal: a backward walk of the hour blocks' key that
  // stops at the first block holding a value in range (the values of one hour are
  // sorted by an incremental sort). `samples` unnests one row per (well, signal, hour),
  // so every read bounds `hour` as well as `t` (migration 20261202000006).
  const latest = (code: number) =>
    `(SELECT t FROM samples WHERE well_id = $1 AND signal = ${code} AND ${hoursOf("$2", "$3")} AND t >= $2 AND t <= $3 ORDER BY hour DESC, t DESC LIMIT 1)`;
  // Named (prepared) statements: planned once per pooled connection (see query-trend-series.ts).
  const last = await db.query<{ t: number | null }>({
    name: "bellows-trend-latest-pressure",
    text: `SELECT date_part('epoch', greatest(${latest(casing)}, ${latest(tubing)})) * 1000 AS t`,
    values: [wellId, new Date(fromMs - LOOK_BACK_MS), new Date(toMs)],
  });
  const end = last.rows[0]?.t ?? null;
  if (end === null) return { casingPsig: null, tubingPsig: null, injectionMscfd: null, windowEnd: null };
  const r = await db.query<{ signal: number; median: number }>({
    name: "bellows-trend-recent-medians",
    text: `SELECT signal, percentile_cont(0.5) WITHIN GROUP (ORDER BY v) AS median FROM samples
     WHERE well_id = $1 AND signal = ANY($2::smallint[]) AND ${hoursOf("$3", "$4")} AND t > $3 AND t <= $4
     GROUP BY signal`,
    values: [wellId, [casing, tubing, injection], new Date(end - RECENT_WINDOW_MS), new Date(end)],
  });
  const of = (code: number) => r.rows.find((row) => Number(row.signal) === code)?.median ?? null;
  return { casingPsig: of(casing), tubingPsig: of(tubing), injectionMscfd: of(injection), windowEnd: Math.round(end) };
}
