// The trends section of the well page: range buttons (1 d / 7 d / 30 d / 90 d, kept
// in the URL as ?range=) and the annotated chart for that range, ending now.
import Link from "next/link";
import type { UnitSystem } from "@/lib/units/units";
import { TrendChart } from "./trend-chart";

export const TREND_RANGES = { "1d": 1, "7d": 7, "30d": 30, "90d": 90 } as const;
export type TrendRangeKey = keyof typeof TREND_RANGES;
const DEFAULT_RANGE: TrendRangeKey = "7d";
const DAY_MS = 86_400_000;
/** The end of the range is rounded up to this, so a reload within it asks for the same data. */
const END_STEP_MS = 5 * 60_000;

export function readTrendRange(raw: string | string[] | undefined): TrendRangeKey {
  const v = Array.isArray(raw) ? raw[0] : raw;
  return v !== undefined && v in TREND_RANGES ? (v as TrendRangeKey) : DEFAULT_RANGE;
}

/** Now, rounded up to END_STEP_MS (a server component renders once per request). */
function rangeEndNow(): number {
  return Math.ceil(Date.now() / END_STEP_MS) * END_STEP_MS;
}

export function TrendChartSection(props: {
  wellId: number;
  timeZone: string;
  unitSystem: UnitSystem;
  range: string | string[] | undefined;
  highlightIssueId?: number;
}) {
  const key = readTrendRange(props.range);
  const to = rangeEndNow();
  const from = to - TREND_RANGES[key] * DAY_MS;
  return (
    <section id="trends" aria-labelledby="trends-heading" className="space-y-2" data-testid="well-trends">
      <div className="flex flex-wrap items-center gap-3">
        <h2 id="trends-heading" className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Trends</h2>
        <nav aria-label="Trend range" className="flex gap-1">
          {(Object.keys(TREND_RANGES) as TrendRangeKey[]).map((k) => (
            <Link
              key={k}
              href={`?range=${k}#trends`}
              scroll={false}
              aria-current={k === key ? "true" : undefined}
              className={`rounded border px-2 py-0.5 text-xs ${k === key ? "border-copper bg-copper-light text-ink" : "border-line bg-paper-raised text-ink-soft hover:border-ink-faint"}`}
            >
              {TREND_RANGES[k]} d
            </Link>
          ))}
        </nav>
      </div>
      <TrendChart
        wellId={props.wellId}
        from={from}
        to={to}
        timeZone={props.timeZone}
        unitSystem={props.unitSystem}
        highlightIssueId={props.highlightIssueId}
      />
    </section>
  );
}
