// Per rule: how many issues the current and the candidate settings would have
// raised over the preview window (findings, not stored issues).
import type { RulePreview } from "@/lib/services/diagnose/preview-rule-settings";

const RULE_LABEL: Record<string, string> = {
  multipointing: "Multipointing",
  heading: "Heading",
  valve_leak: "Valve stuck open or leaking",
  liquid_loading: "Liquid loading",
  frac_hit: "Frac hit",
  over_injection: "Over-injection",
  fast_kickoff: "Kick-off too fast",
  data_quality: "Data quality",
};

export function RulePreviewTable({ preview }: { preview: RulePreview }) {
  const span = preview.from && preview.to ? `${new Date(preview.from).toLocaleDateString()} – ${new Date(preview.to).toLocaleDateString()}` : "no data";
  return (
    <section className="rounded border border-line bg-paper-raised p-3" aria-label="Preview">
      <p className="mb-2 text-sm">
        Last {preview.days} days of data ({span}), {preview.wellsWithData} of {preview.wells} wells with data. Nothing was saved or raised.
      </p>
      <table className="data-table" data-testid="rule-preview">
        <thead>
          <tr><th>Rule</th><th className="text-right">Current settings</th><th className="text-right">These settings</th><th className="text-right">Change</th></tr>
        </thead>
        <tbody>
          {preview.rules.map((r) => {
            const d = r.candidate - r.current;
            return (
              <tr key={r.rule}>
                <td>{RULE_LABEL[r.rule] ?? r.rule}</td>
                <td className="text-right">{r.current}</td>
                <td className="text-right">{r.candidate}</td>
                <td className={`text-right ${d > 0 ? "text-warn" : d < 0 ? "text-good" : "text-ink-faint"}`}>{d > 0 ? `+${d}` : d}</td>
              </tr>
            );
          })}
          <tr>
            <td>Pad-wide field events</td>
            <td className="text-right">{preview.fieldEvents.current}</td>
            <td className="text-right">{preview.fieldEvents.candidate}</td>
            <td className="text-right text-ink-faint">{preview.fieldEvents.candidate - preview.fieldEvents.current}</td>
          </tr>
        </tbody>
      </table>
    </section>
  );
}
