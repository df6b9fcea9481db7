// Field events: every well on a pad losing injection at once is a supply outage
// (compressor down), not a problem of each well (DOMAIN.md §4). We compare each
// well's 10-minute injection with its own median and call a field event where at
// least minWellFraction (and minWells) of the pad's wells are out together for
// minDurationMinutes. The event window is padded by leadMinutes before and
// recoveryMinutes after, since wells take hours to come back.
import type { AlignedSeries, FieldEvent } from "@/lib/diagnostics/types";
import type { RuleSettings } from "@/lib/diagnostics/settings";
import { DEFAULT_SETTINGS } from "@/lib/diagnostics/settings";
import { toFloat64 } from "@/lib/diagnostics/stats/series-prep";
import { binSeries } from "@/lib/diagnostics/stats/bins";
import { findRuns } from "@/lib/diagnostics/stats/runs";
import { median } from "simple-statistics";

const BIN_MIN = 10;
const MINUTE_MS = 60_000;

export function detectFieldEvents(padSeries: { wellId: string; series: AlignedSeries }[], settings: RuleSettings = DEFAULT_SETTINGS): FieldEvent[] {
  const s = settings.fieldEvents;
  const usable = padSeries.filter((p) => p.series.injection && p.series.t.length > 1);
  if (usable.length < s.minWells) return [];
  const t0 = Math.min(...usable.map((p) => p.series.t[0]));
  const t1 = Math.max(...usable.map((p) => p.series.t[p.series.t.length - 1]));
  const nb = Math.floor((t1 - t0) / (BIN_MIN * MINUTE_MS)) + 1;
  const outCount = new Uint16Array(nb);
  const liveCount = new Uint16Array(nb);
  const outWells: Set<string>[] = Array.from({ length: nb }, () => new Set());
  for (const p of usable) {
    const inj = binSeries(toFloat64(p.series.injection, p.series.t.length), BIN_MIN).median;
    const finite = Array.from(inj).filter((v) => v === v);
    if (!finite.length) continue;
    const usual = median(finite);
    const offset = Math.round((p.series.t[0] - t0) / (BIN_MIN * MINUTE_MS));
    for (let b = 0; b < inj.length; b++) {
      const v = inj[b];
      const k = b + offset;
      if (v !== v || k < 0 || k >= nb) continue;
      liveCount[k]++;
      if (v < s.outageFraction * usual) { outCount[k]++; outWells[k].add(p.wellId); }
    }
  }
  const flags = new Uint8Array(nb);
  for (let k = 0; k < nb; k++) {
    if (outCount[k] >= s.minWells && outCount[k] >= s.minWellFraction * liveCount[k]) flags[k] = 1;
  }
  return findRuns(flags, Math.max(1, Math.round(s.minDurationMinutes / BIN_MIN)), 1).map((r) => {
    const wells = new Set<string>();
    for (let k = r.from; k < r.to; k++) for (const id of outWells[k]) wells.add(id);
    return {
      kind: "injection_outage",
      start: t0 + r.from * BIN_MIN * MINUTE_MS - s.leadMinutes * MINUTE_MS,
      end: t0 + r.to * BIN_MIN * MINUTE_MS + s.recoveryMinutes * MINUTE_MS,
      wellIds: [...wells].sort(),
    };
  });
}
