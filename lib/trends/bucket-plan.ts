// How to reduce a trend for a chart of a given pixel width. A line chart cannot show
// more than about one value per pixel column, so past ~2 points per pixel we send
// each time bucket's minimum and maximum instead of every value: the envelope keeps
// one-minute spikes and heading cycles visible, which an average would smooth away.
// (Min/max per pixel column is common practice for time-series plotting.)

export const MINUTE_MS = 60_000;
/** The rollup table's bucket (samples_15m). */
export const ROLLUP_BUCKET_MS = 15 * MINUTE_MS;
/** The hourly rollup's bucket (samples_1h, built from samples_15m). */
export const HOURLY_BUCKET_MS = 60 * MINUTE_MS;
/** The 3-hour rollup's bucket (samples_3h, built from samples_1h): a 90-day chart's bucket. */
export const THREE_HOUR_BUCKET_MS = 3 * HOURLY_BUCKET_MS;
/** Hard cap on points per signal, whatever the width asked for. */
export const MAX_POINTS_PER_SIGNAL = 2000;
export const DEFAULT_WIDTH_PX = 1200;

/**
 * Bucket lengths we use, shortest first. Every step of 15 minutes and up is a whole
 * number of 15-minute buckets, and every step of an hour and up a whole number of
 * hours, so long ranges can be answered from a rollup alone; each also divides a
 * day, so buckets line up with midnight UTC.
 */
export const NICE_BUCKETS_MS: readonly number[] = [
  10_000, 30_000,
  ...[1, 2, 5, 10, 15, 30, 60, 120, 180, 360, 720, 1440].map((m) => m * MINUTE_MS),
];

export type Resolution = "raw" | "minmax";
/** samples: the stored values; rollup: samples_15m; hourly: samples_1h; three_hourly: samples_3h. */
export type BucketSource = "samples" | "rollup" | "hourly" | "three_hourly";

/** The length of one stored row of each source (1 ms for the samples themselves). */
export const SOURCE_ROW_MS: Record<BucketSource, number> = {
  samples: 1,
  rollup: ROLLUP_BUCKET_MS,
  hourly: HOURLY_BUCKET_MS,
  three_hourly: THREE_HOUR_BUCKET_MS,
};

export interface BucketPlan {
  resolution: Resolution;
  /** 0 for raw. */
  bucketMs: number;
  /** Which table the buckets are computed from; null for raw. */
  source: BucketSource | null;
  /** Points per signal we allow. */
  cap: number;
}

/** Points per signal for a chart `widthPx` wide: two per pixel column, at most 2,000. */
export function pointCap(widthPx: number): number {
  const w = Number.isFinite(widthPx) && widthPx > 0 ? Math.round(widthPx) : DEFAULT_WIDTH_PX;
  return Math.max(2, Math.min(2 * w, MAX_POINTS_PER_SIGNAL));
}

/** The shortest nice bucket that keeps two points per bucket within the cap. */
export function chooseBucketMs(rangeMs: number, cap: number): number {
  const buckets = Math.max(1, Math.floor(cap / 2));
  const needed = rangeMs / buckets;
  for (const b of NICE_BUCKETS_MS) if (b >= needed) return b;
  // Longer than a day per bucket (multi-year ranges): whole days.
  return Math.ceil(needed / NICE_BUCKETS_MS[NICE_BUCKETS_MS.length - 1]) * NICE_BUCKETS_MS[NICE_BUCKETS_MS.length - 1];
}

/**
 * The coarsest table whose buckets divide `bucketMs`, so the fewest rows are read:
 * the 3-hour rollup for buckets of whole 3 hours, the hourly rollup for whole hours,
 * the 15-minute rollup for whole quarter hours, the samples for shorter buckets.
 */
export function chooseBucketSource(bucketMs: number): BucketSource {
  if (bucketMs % THREE_HOUR_BUCKET_MS === 0) return "three_hourly";
  if (bucketMs % HOURLY_BUCKET_MS === 0) return "hourly";
  if (bucketMs % ROLLUP_BUCKET_MS === 0) return "rollup";
  return "samples";
}

/**
 * Raw values when the densest signal fits under the cap; otherwise min/max buckets
 * of chooseBucketMs, read from the table chooseBucketSource names.
 */
export function planBuckets(input: { fromMs: number; toMs: number; widthPx: number; maxRawCount: number }): BucketPlan {
  const cap = pointCap(input.widthPx);
  if (input.maxRawCount <= cap) return { resolution: "raw", bucketMs: 0, source: null, cap };
  const bucketMs = chooseBucketMs(input.toMs - input.fromMs, cap);
  return { resolution: "minmax", bucketMs, source: chooseBucketSource(bucketMs), cap };
}
