// Align irregular samples to a 1-minute grid (last value in each minute wins),
// so every rule can index minutes directly. Already-regular input is used as is.
export const MINUTE_MS = 60_000;

/** True when `t` is strictly 1-minute spaced. */
export function isMinuteGrid(t: ArrayLike<number>): boolean {
  const n = t.length;
  if (n < 2) return true;
  return t[n - 1] - t[0] === (n - 1) * MINUTE_MS && t[1] - t[0] === MINUTE_MS;
}

/** Minute grid from floor(t[0]) to floor(t[n−1]) and each signal placed on it (NaN where no sample fell). */
export function alignToMinutes(t: ArrayLike<number>, signals: Float64Array[]): { t: Float64Array; signals: Float64Array[] } {
  const start = Math.floor(t[0] / MINUTE_MS) * MINUTE_MS;
  const end = Math.floor(t[t.length - 1] / MINUTE_MS) * MINUTE_MS;
  const m = (end - start) / MINUTE_MS + 1;
  const grid = new Float64Array(m);
  for (let i = 0; i < m; i++) grid[i] = start + i * MINUTE_MS;
  const out = signals.map(() => new Float64Array(m).fill(NaN));
  for (let i = 0; i < t.length; i++) {
    const k = Math.floor((t[i] - start) / MINUTE_MS);
    if (k < 0 || k >= m) continue;
    for (let s = 0; s < signals.length; s++) {
      const v = signals[s][i];
      if (v === v) out[s][k] = v;
    }
  }
  return { t: grid, signals: out };
}
