// Autocorrelation and dominant period, for heading (periodic instability).
// DOMAIN.md §4: "detect a dominant period (autocorrelation or spectrum) with an
// amplitude above a threshold relative to the mean". Detrending removes the slow
// drift so that a level change does not look like a long period.

/**
 * Sample autocorrelation of values[from, to) at lags 0..maxLag after removing a
 * least-squares line. NaN samples are skipped pairwise. Result[0] = 1.
 */
export function autocorrelation(values: Float64Array, from: number, to: number, maxLag: number, out?: Float64Array): Float64Array {
  const n = to - from;
  const acf = out ?? new Float64Array(maxLag + 1);
  // Least-squares line over finite points (x = index).
  let sx = 0, sy = 0, sxx = 0, sxy = 0, c = 0;
  for (let i = 0; i < n; i++) {
    const y = values[from + i];
    if (y !== y) continue;
    sx += i; sy += y; sxx += i * i; sxy += i * y; c++;
  }
  if (c < 4) { acf.fill(NaN); return acf; }
  const den = c * sxx - sx * sx;
  const slope = den !== 0 ? (c * sxy - sx * sy) / den : 0;
  const icpt = (sy - slope * sx) / c;
  let var0 = 0;
  for (let i = 0; i < n; i++) {
    const y = values[from + i];
    if (y === y) { const r = y - icpt - slope * i; var0 += r * r; }
  }
  var0 /= c;
  for (let lag = 0; lag <= maxLag; lag++) {
    let s = 0, m = 0;
    for (let i = 0; i + lag < n; i++) {
      const a = values[from + i];
      const b = values[from + i + lag];
      if (a !== a || b !== b) continue;
      s += (a - icpt - slope * i) * (b - icpt - slope * (i + lag));
      m++;
    }
    acf[lag] = m > 0 && var0 > 0 ? s / m / var0 : NaN;
  }
  return acf;
}

export interface DominantPeriod {
  lag: number;
  value: number;
}

/**
 * The first autocorrelation peak in [minLag, maxLag] that follows a dip below
 * zero: a true oscillation, not the slow decay of a step or a trend.
 */
export function findDominantPeriod(acf: Float64Array, minLag: number, maxLag: number): DominantPeriod | null {
  let dipped = false;
  const last = Math.min(maxLag, acf.length - 2);
  for (let lag = 1; lag <= last; lag++) {
    const v = acf[lag];
    if (v !== v) continue;
    if (v < 0) dipped = true;
    if (!dipped || lag < minLag) continue;
    if (v > acf[lag - 1] && v >= acf[lag + 1] && v > 0) return { lag, value: v };
  }
  return null;
}
