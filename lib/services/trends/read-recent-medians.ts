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
export const LOOK_BACK_MS = 7 * 86_400_000;

export interface RecentMedians {
  casingPsig: number | null;
  tubingPsig: number | null;
  injectionMscfd: number | null;
  /** Time of the latest pressure value used, epoch ms; null when there was none. */
  windowEnd: number | null;
}

// One statement: the latest pressure time first (a MATERIALIZED CTE, computed once),
// then the medians over the window before it through a LATERAL join, where the
// window's bounds are run-time parameters: PostgreSQL prunes the months and walks
// one primary-key range per signal (0.6 ms measured on 90 days of 1-minute data).
// A plain join to the latest-time lookup could not use the bound in the index and
// read every value of the well (~0.9 s measured).
const latest = (code: number) =>
  `(SELECT t FROM samples WHERE well_id = $1 AND signal = ${code} AND ${hoursOf("$2", "$3")} AND t >= $2 AND t <= $3 ORDER BY hour DESC, t DESC LIMIT 1)`;
/** The signal's latest stored time, whatever the range (live-medians-cache.ts). */
const last = (code: number) => `(SELECT t FROM samples WHERE well_id = $1 AND signal = ${code} ORDER BY hour DESC, t DESC LIMIT 1)`;
const median = (code: number) => `percentile_cont(0.5) WITHIN GROUP (ORDER BY v) FILTER (WHERE signal = ${code})`;
const RECENT_SQL = `
WITH e AS MATERIALIZED (
  SELECT greatest(${latest(SIGNAL_CODE.casing_pressure)}, ${latest(SIGNAL_CODE.tubing_pressure)}) AS t_end
)
SELECT date_part('epoch', e.t_end) * 1000 AS t, m.casing, m.tubing, m.injection,
  date_part('epoch', ${last(SIGNAL_CODE.casing_pressure)}) * 1000 AS casing_last,
  date_part('epoch', ${last(SIGNAL_CODE.tubing_pressure)}) * 1000 AS tubing_last
FROM e LEFT JOIN LATERAL (
  SELECT ${median(SIGNAL_CODE.casing_pressure)} AS casing, ${median(SIGNAL_CODE.tubing_pressure)} AS tubing,
         ${median(SIGNAL_CODE.injection_rate)} AS injection
  FROM samples
  WHERE well_id = $1 AND signal = ANY($4::smallint[])
    AND ${hoursOf("(e.t_end - $5::bigint * interval '1 millisecond')", "e.t_end")}
    AND t > e.t_end - $5::bigint * interval '1 millisecond' AND t <= e.t_end
) m ON true`;

/** The medians, and each pressure signal's latest stored time (casing, tubing; null without values), read together. */
export interface RecentRead {
  medians: RecentMedians;
  latestMs: (number | null)[];
}

export async function readRecentMedians(db: pg.Pool | pg.ClientBase, wellId: number, fromMs: number, toMs: number): Promise<RecentRead> {
  // Named (prepared) statement: planned once per pooled connection (see query-trend-series.ts).
  const r = await db.query<{ t: number | null; casing: number | null; tubing: number | null; injection: number | null; casing_last: number | null; tubing_last: number | null }>({
    name: "bellows-trend-recent",
    text: RECENT_SQL,
    values: [wellId, new Date(fromMs - LOOK_BACK_MS), new Date(toMs), RECENT_MEDIAN_CODES, RECENT_WINDOW_MS],
  });
  const row = r.rows[0];
  const latestMs = [row?.casing_last ?? null, row?.tubing_last ?? null].map((t) => (t === null ? null : Math.round(t)));
  if (!row || row.t === null) return { medians: { casingPsig: null, tubingPsig: null, injectionMscfd: null, windowEnd: null }, latestMs };
  return { medians: { casingPsig: row.casing, tubingPsig: row.tubing, injectionMscfd: row.injection, windowEnd: Math.round(row.t) }, latestMs };
}
