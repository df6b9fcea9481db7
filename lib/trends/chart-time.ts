// Time text for the chart's caption and its table of numbers, in the field's time
// zone (IANA name), so a night-shift event reads at the hour the operator saw it.
const formatters = new Map<string, Intl.DateTimeFormat>();

export function formatFieldTime(ms: number, timeZone: string): string {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat("en-GB", {
      timeZone, year: "numeric", month: "short", day: "2-digit", hour: "2-digit", minute: "2-digit", hourCycle: "h23",
    });
    formatters.set(timeZone, f);
  }
  return f.format(new Date(ms));
}

/** "15 min", "3 h", "1 d": a bucket length in plain words. */
export function formatBucket(ms: number): string {
  const min = ms / 60_000;
  if (min < 1) return `${Math.round(ms / 1000)} s`;
  if (min < 60) return `${Math.round(min)} min`;
  if (min < 1440) return `${Math.round(min / 60)} h`;
  return `${Math.round(min / 1440)} d`;
}

/** A shorter range centred on the same middle, or a wider one (factor > 1). */
export function scaleRange(from: number, to: number, factor: number, minSpanMs = 10 * 60_000): { from: number; to: number } {
  const mid = (from + to) / 2;
  const half = Math.max((to - from) * factor, minSpanMs) / 2;
  return { from: Math.round(mid - half), to: Math.round(mid + half) };
}

/** The same span moved by `fraction` of itself (negative = earlier). */
export function shiftRange(from: number, to: number, fraction: number): { from: number; to: number } {
  const d = Math.round((to - from) * fraction);
  return { from: from + d, to: to + d };
}
