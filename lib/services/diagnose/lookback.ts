// How much data before `from` the rules need to judge `from` onward. Each rule
// compares against the well's own recent normal (general.baselineMinutes, a day by
// default) and a kick-off can last kickoff.maxMinutes (1.5 days) before it is
// recognised as one; over-injection compares two long windows. Three days covers
// the defaults with room to spare; larger settings stretch it.
import type { RuleSettings } from "@/lib/diagnostics/settings";

const MINUTE_MS = 60_000;
export const MIN_LOOKBACK_MS = 3 * 1440 * MINUTE_MS;

export function lookbackMs(settings: RuleSettings[]): number {
  let minutes = 0;
  for (const s of settings) {
    const longest = Math.max(
      s.kickoff.maxMinutes,
      s.overInjection.compareMinutes * 2 + s.overInjection.minDurationMinutes,
      s.heading.windowMinutes,
      s.dataQuality.flatlineMinutes,
    );
    minutes = Math.max(minutes, s.general.baselineMinutes + longest);
  }
  return Math.max(MIN_LOOKBACK_MS, minutes * MINUTE_MS);
}

const DAY_MS = 1440 * MINUTE_MS;

/**
 * Where a run's data starts: `lookback` before `from`, moved back to the start of
 * that UTC day. The rules lay their bins and sliding windows from the first value
 * they are given, so two runs starting at different times of day saw the same
 * episode through different windows and wrote slightly different words and numbers
 * for it (a heading issue's period, swing and production at risk flipped between the
 * hourly sweep's view and a longer run's, found on the demo field). Starting every
 * run at midnight UTC lays the same grid for any step that divides a day.
 */
export function dataStart(from: number, lookback: number): number {
  return Math.floor((from - lookback) / DAY_MS) * DAY_MS;
}
