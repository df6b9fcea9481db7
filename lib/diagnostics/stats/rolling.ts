// Rolling statistics over NaN-gapped typed arrays, O(n) by running sums.
// (simple-statistics works on whole arrays; it has no gap-aware rolling window.)

/** Centered rolling mean over `window` samples, ignoring NaN; NaN where the window is empty. */
export function rollingMean(values: Float64Array, window: number): Float64Array {
  const n = values.length;
  const out = new Float64Array(n);
  const half = Math.floor(window / 2);
  let sum = 0;
  let cnt = 0;
  let lo = 0;
  let hi = 0; // window is [lo, hi)
  for (let i = 0; i < n; i++) {
    const wantLo = Math.max(0, i - half);
    const wantHi = Math.min(n, i - half + window);
    while (hi < wantHi) {
      const v = values[hi++];
      if (v === v) { sum += v; cnt++; }
    }
    while (lo < wantLo) {
      const v = values[lo++];
      if (v === v) { sum -= v; cnt--; }
    }
    out[i] = cnt > 0 ? sum / cnt : NaN;
  }
  return out;
}

/** Root mean square of (values − reference), per centered window, ignoring NaN. */
export function rollingRms(values: Float64Array, reference: Float64Array, window: number): Float64Array {
  const dev = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) {
    const d = values[i] - reference[i];
    dev[i] = d * d;
  }
  const ms = rollingMean(dev, window);
  for (let i = 0; i < ms.length; i++) ms[i] = Math.sqrt(ms[i]);
  return ms;
}

/** Centered rolling median over a short window (O(n·w·log w): keep w small, e.g. ≤ 31). */
export function rollingMedian(values: Float64Array, window: number): Float64Array {
  const n = values.length;
  const out = new Float64Array(n);
  const half = Math.floor(window / 2);
  const buf = new Float64Array(window);
  for (let i = 0; i < n; i++) {
    let k = 0;
    const a = Math.max(0, i - half);
    const b = Math.min(n, i - half + window);
    for (let j = a; j < b; j++) {
      const v = values[j];
      if (v === v) buf[k++] = v;
    }
    if (k === 0) { out[i] = NaN; continue; }
    const s = buf.subarray(0, k).sort();
    const h = k >> 1;
    out[i] = k % 2 ? s[h] : (s[h - 1] + s[h]) / 2;
  }
  return out;
}
