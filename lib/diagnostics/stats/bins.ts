// Fixed-width time bins (10 minutes by default): the rules read bin medians,
// which shrug off single-minute noise and spikes and cut the work tenfold.
export interface Bins {
  binSize: number;
  median: Float64Array;
  min: Float64Array;
  max: Float64Array;
  mean: Float64Array;
  count: Uint16Array;
}

/**
 * Median, min, max, mean and count of finite values in each bin of `binSize` samples.
 * NaN for empty bins. `withMedian` false skips the median (left NaN) when only means are wanted.
 */
export function binSeries(values: Float64Array, binSize: number, withMedian = true): Bins {
  const nb = Math.ceil(values.length / binSize);
  const median = new Float64Array(nb);
  const min = new Float64Array(nb);
  const max = new Float64Array(nb);
  const mean = new Float64Array(nb);
  const count = new Uint16Array(nb);
  const scratch = new Float64Array(binSize);
  for (let b = 0; b < nb; b++) {
    const from = b * binSize;
    const to = Math.min(values.length, from + binSize);
    let k = 0;
    let sum = 0;
    let lo = Infinity;
    let hi = -Infinity;
    for (let i = from; i < to; i++) {
      const v = values[i];
      if (v !== v) continue;
      scratch[k++] = v;
      sum += v;
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
    count[b] = k;
    if (k === 0) {
      median[b] = min[b] = max[b] = mean[b] = NaN;
      continue;
    }
    min[b] = lo;
    max[b] = hi;
    mean[b] = sum / k;
    median[b] = withMedian ? medianInPlace(scratch, k) : NaN;
  }
  return { binSize, median, min, max, mean, count };
}

/** Median of the first `k` entries of `buf` (sorted in place). */
export function medianInPlace(buf: Float64Array, k: number): number {
  if (k === 0) return NaN;
  const h = k >> 1;
  if (k <= 24) {
    sortPrefix(buf, k);
    return k % 2 ? buf[h] : (buf[h - 1] + buf[h]) / 2;
  }
  // Longer windows: selection (expected O(k)) instead of a full sort.
  const upper = selectKth(buf, k, h);
  if (k % 2) return upper;
  let lowerMax = -Infinity;
  for (let i = 0; i < h; i++) if (buf[i] > lowerMax) lowerMax = buf[i];
  return (lowerMax + upper) / 2;
}

/**
 * Hoare's quickselect (Hoare 1961, "Algorithm 65: Find") on buf[0, k): returns the
 * value of rank `rank` (0-based) and leaves smaller values before it. Middle-element
 * pivot; in place, no allocation.
 */
export function selectKth(buf: Float64Array, k: number, rank: number): number {
  let lo = 0, hi = k - 1;
  while (hi > lo) {
    const pivot = buf[(lo + hi) >> 1];
    let i = lo, j = hi;
    while (i <= j) {
      while (buf[i] < pivot) i++;
      while (buf[j] > pivot) j--;
      if (i <= j) {
        const t = buf[i]; buf[i] = buf[j]; buf[j] = t;
        i++; j--;
      }
    }
    if (rank <= j) hi = j;
    else if (rank >= i) lo = i;
    else return buf[rank];
  }
  return buf[rank];
}

/**
 * Sort buf[0, k) ascending in place. Insertion sort for the short windows the rules
 * use (it beats the built-in sort's call overhead below ~64 items, and allocates nothing).
 */
export function sortPrefix(buf: Float64Array, k: number): void {
  if (k > 64) {
    buf.subarray(0, k).sort();
    return;
  }
  for (let i = 1; i < k; i++) {
    const v = buf[i];
    let j = i - 1;
    while (j >= 0 && buf[j] > v) { buf[j + 1] = buf[j]; j--; }
    buf[j + 1] = v;
  }
}

const rangeScratch = { buf: new Float64Array(256) };

/** Median of the finite values in values[from, to). NaN if none. */
export function medianOfRange(values: Float64Array, from: number, to: number): number {
  const a = Math.max(0, from);
  const b = Math.min(values.length, to);
  if (b - a > rangeScratch.buf.length) rangeScratch.buf = new Float64Array(b - a);
  let k = 0;
  for (let i = a; i < b; i++) {
    const v = values[i];
    if (v === v) rangeScratch.buf[k++] = v;
  }
  return medianInPlace(rangeScratch.buf, k);
}

/** Quantile q (0..1) of the finite values in values[from, to). NaN if none. */
export function quantileOfRange(values: Float64Array, from: number, to: number, q: number): number {
  const a = Math.max(0, from);
  const b = Math.min(values.length, to);
  if (b - a > rangeScratch.buf.length) rangeScratch.buf = new Float64Array(b - a);
  let k = 0;
  for (let i = a; i < b; i++) {
    const v = values[i];
    if (v === v) rangeScratch.buf[k++] = v;
  }
  if (k === 0) return NaN;
  const s = rangeScratch.buf;
  sortPrefix(s, k);
  const pos = q * (k - 1);
  const lo = Math.floor(pos);
  const hi = Math.min(k - 1, lo + 1);
  return s[lo] + (s[hi] - s[lo]) * (pos - lo);
}

/** O(1) NaN-aware range means from prefix sums: build once, then ask for any [from, to). */
export function createRangeMean(values: Float64Array): (from: number, to: number) => number {
  const n = values.length;
  const sum = new Float64Array(n + 1);
  const cnt = new Uint32Array(n + 1);
  for (let i = 0; i < n; i++) {
    const v = values[i];
    const ok = v === v;
    sum[i + 1] = sum[i] + (ok ? v : 0);
    cnt[i + 1] = cnt[i] + (ok ? 1 : 0);
  }
  return (from, to) => {
    const a = Math.max(0, from), b = Math.min(n, to);
    if (b <= a) return NaN;
    const c = cnt[b] - cnt[a];
    return c > 0 ? (sum[b] - sum[a]) / c : NaN;
  };
}
