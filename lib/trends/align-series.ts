// Put several series with their own time stamps on one shared time axis, as a
// chart panel needs: the union of all times, with null where a series has no value
// at that time (the chart bridges those; a null the series itself carries is a gap).
export interface TimedValues {
  t: readonly number[];
  v: readonly (number | null)[];
}

export interface AlignedPanel {
  t: number[];
  /** One array per input series, each as long as t; undefined = no value at that time. */
  values: (number | null | undefined)[][];
}

export function alignSeries(series: readonly TimedValues[]): AlignedPanel {
  const times = new Set<number>();
  for (const s of series) for (const t of s.t) times.add(t);
  const t = [...times].sort((a, b) => a - b);
  const index = new Map(t.map((x, i) => [x, i]));
  const values = series.map((s) => {
    const out: (number | null | undefined)[] = new Array(t.length).fill(undefined);
    s.t.forEach((x, i) => {
      out[index.get(x)!] = s.v[i];
    });
    return out;
  });
  return { t, values };
}

/** Apply `convert` to every number, keeping nulls and missing values. */
export function convertValues<T extends number | null | undefined>(values: readonly T[], convert: (v: number) => number): T[] {
  return values.map((v) => (typeof v === "number" ? convert(v) : v)) as T[];
}
