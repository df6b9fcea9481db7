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
