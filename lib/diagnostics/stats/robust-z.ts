// Robust z-score with the median and MAD (Hampel filter). 1.4826 makes the MAD a
// consistent estimator of the standard deviation for normal data (Rousseeuw &
// Croux 1993). simple-statistics gives the MAD of an array; this is the per-point
// form used inside rolling windows.
export const MAD_TO_SIGMA = 1.4826;

export function robustZ(value: number, median: number, mad: number, floor = 1e-9): number {
  return (value - median) / Math.max(MAD_TO_SIGMA * mad, floor);
}
