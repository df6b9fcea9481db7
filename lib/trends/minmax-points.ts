// Turn per-bucket minimum and maximum into chart points. Each bucket gives two
// points, in the order the extremes happened, placed at a quarter and three
// quarters of the bucket so every point has its own time and all signals of one
// answer share the same time grid (the chart joins them without re-sorting).

export interface MinMaxBucket {
  /** Bucket start, epoch ms. */
  bucket: number;
  vmin: number;
  vmax: number;
  /** True when the minimum came before the maximum inside the bucket. */
  isMinFirst: boolean;
}

export interface PointSeries {
  t: number[];
  v: (number | null)[];
}

/** Bucket extremes to points, in time order (buckets must be sorted by start). */
export function toMinMaxPoints(buckets: readonly MinMaxBucket[], bucketMs: number): PointSeries {
  const t: number[] = [];
  const v: (number | null)[] = [];
  for (const b of buckets) {
    const [first, second] = b.isMinFirst ? [b.vmin, b.vmax] : [b.vmax, b.vmin];
    t.push(b.bucket + bucketMs / 4, b.bucket + (3 * bucketMs) / 4);
    v.push(first, second);
  }
  return { t, v };
}

/**
 * Where the rollup cannot say which extreme came first (both in the same 15-minute
 * bucket), guess from the first value: a bucket that opened nearer its minimum most
 * likely rose to its maximum afterwards.
 */
export function guessMinFirst(vfirst: number, vmin: number, vmax: number): boolean {
  return vfirst - vmin <= vmax - vfirst;
}

/** Order of the extremes from their times; a tie falls back to the first-value guess. */
export function isMinFirst(tMin: number, tMax: number, vfirst: number, vmin: number, vmax: number): boolean {
  if (tMin !== tMax) return tMin < tMax;
  return guessMinFirst(vfirst, vmin, vmax);
}

/** The typical (median) spacing between consecutive points; null with fewer than two. */
export function medianStep(t: readonly number[]): number | null {
  if (t.length < 2) return null;
  const steps: number[] = [];
  for (let i = 1; i < t.length; i++) steps.push(t[i] - t[i - 1]);
  steps.sort((a, b) => a - b);
  return steps[Math.floor(steps.length / 2)];
}

/**
 * Put a null between two points further apart than `factor` typical steps (and at
 * least `minGapMs`), so the chart breaks the line over missing data instead of
 * drawing a straight line across an outage.
 */
export function breakGaps(series: PointSeries, options: { factor?: number; minGapMs?: number } = {}): PointSeries {
  const step = medianStep(series.t);
  if (step === null) return series;
  const limit = Math.max(step * (options.factor ?? 5), options.minGapMs ?? 0);
  const t: number[] = [];
  const v: (number | null)[] = [];
  for (let i = 0; i < series.t.length; i++) {
    if (i > 0 && series.t[i] - series.t[i - 1] > limit) {
      t.push((series.t[i] + series.t[i - 1]) / 2);
      v.push(null);
    }
    t.push(series.t[i]);
    v.push(series.v[i]);
  }
  return { t, v };
}
