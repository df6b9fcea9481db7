// Turn loosely typed input (arrays with null or NaN gaps) into Float64Arrays
// with NaN for every gap, so the rules loop over typed arrays only.
import type { SeriesValues } from "@/lib/diagnostics/types";

/** Copy `values` into a Float64Array of length `n`; null, undefined and non-finite become NaN. */
export function toFloat64(values: SeriesValues | undefined, n: number): Float64Array {
  const out = new Float64Array(n).fill(NaN);
  if (!values) return out;
  const m = Math.min(n, values.length);
  for (let i = 0; i < m; i++) {
    const v = values[i];
    if (v !== null && v !== undefined && Number.isFinite(v)) out[i] = v;
  }
  return out;
}

/** Number of finite values. */
export function countFinite(values: Float64Array): number {
  let c = 0;
  for (let i = 0; i < values.length; i++) if (values[i] === values[i]) c++;
  return c;
}
