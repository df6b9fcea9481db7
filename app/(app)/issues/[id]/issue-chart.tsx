// The trend chart (components/trend-chart.tsx) focused on the issue window,
// with some context either side so the change into the signature shows.
import { TrendChart } from "@/components/trend-chart";
import type { UnitSystem } from "@/lib/units/units";

const HOUR = 3_600_000;

export function IssueChart(props: { wellId: number; from: string; to: string; issueId: number; timeZone: string; unitSystem: UnitSystem; nowMs: number }) {
  const start = new Date(props.from).getTime();
  const end = new Date(props.to).getTime();
  // A quarter of the window (at least 6 h, at most 3 days) before and after.
  const pad = Math.min(72 * HOUR, Math.max(6 * HOUR, (end - start) / 4));
  return (
    <section id="issue-chart" aria-label="Trend chart around the issue" className="rounded border border-line bg-paper-raised p-2">
      <TrendChart wellId={props.wellId} from={start - pad} to={Math.min(end + pad, props.nowMs)} timeZone={props.timeZone} unitSystem={props.unitSystem} highlightIssueId={props.issueId} />
    </section>
  );
}
