// Turn per-bucket minimum and maximum into chart points. Each bucket gives two
// points, in the order the extremes happened, placed at a quarter and three
// quarters of the bucket so every point has its own time and all signals of one
// answer share the same time grid (the chart joins them without re-sorting).

export interface PointSeries {
  t: number[];
  v: (number | null)[];
}

/**
 * The times of the two points of each bucket (starts in ms, sorted): a quarter and
 * three quarters into it. The values come from the database already in the order
 * the extremes happened (see isMinFirst below and query-trend-series.ts).
 */
export function minMaxPointTimes(starts: readonly number[], bucketMs: number): number[] {
  const t = new Array<number>(starts.length * 2);
  for (let i = 0; i < starts.length; i++) {
    t[2 * i] = starts[i] + bucketMs / 4;
    t[2 * i + 1] = starts[i] + (3 * bucketMs) / 4;
  }
  return t;
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
  // A typed array sorts numerically without a comparator call per comparison.
  const steps = new Float64Array(t.length - 1);
  for (let i = 1; i < t.length; i++) steps[i - 1] = t[i] - t[i - 1];
  steps.sort();
  return steps[Math.floor(steps.length / 2)];
}

export interface GapOptions {
  /** How many typical steps make a gap (default 5). */
  factor?: number;
  /** The shortest gap, ms, whatever the typical step (default 0). */
  minGapMs?: number;
}

/**
 * The positions i (ascending) where point i is further from point i − 1 than
 * `factor` typical steps and at least `minGapMs`: where the chart should break the
 * line over missing data instead of drawing a straight line across an outage.
 */
export function gapPositions(t: readonly number[], options: GapOptions = {}): number[] {
  const step = medianStep(t);
  if (step === null) return [];
  const limit = Math.max(step * (options.factor ?? 5), options.minGapMs ?? 0);
  const out: number[] = [];
  for (let i = 1; i < t.length; i++) if (t[i] - t[i - 1] > limit) out.push(i);
  return out;
}

/** The times with a point added midway into each gap (positions from gapPositions). */
export function timesWithGaps(t: readonly number[], gaps: readonly number[]): number[] {
  if (gaps.length === 0) return t as number[];
  const out: number[] = [];
  let next = 0;
  for (let i = 0; i < t.length; i++) {
    if (next < gaps.length && gaps[next] === i) {
      out.push((t[i] + t[i - 1]) / 2);
      next++;
    }
    out.push(t[i]);
  }
  return out;
}

/** The series with a null point midway into each gap (see gapPositions). */
export function breakGaps(series: PointSeries, options: GapOptions = {}): PointSeries {
  const gaps = gapPositions(series.t, options);
  if (gaps.length === 0) return series;
  const v: (number | null)[] = [];
  let next = 0;
  for (let i = 0; i < series.v.length; i++) {
    if (next < gaps.length && gaps[next] === i) {
      v.push(null);
      next++;
    }
    v.push(series.v[i]);
  }
  return { t: timesWithGaps(series.t, gaps), v };
}
