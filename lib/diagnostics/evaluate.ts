// Score findings against labelled windows (synthetic truth), per rule:
// - a label is detected (TP) when a finding of the same rule overlaps it, allowing
//   `slackMs` either side; otherwise it is missed (FN);
// - a finding that overlaps no label of its rule is a false alarm (FP);
// - onset error is |finding start − label start| for the first matching finding.
import type { Finding, RuleKey } from "@/lib/diagnostics/types";
import { RULE_KEYS } from "@/lib/diagnostics/types";

export interface LabelledWindow {
  kind: string;
  start: number;
  /** Null = lasts past the end of the data. */
  end: number | null;
}

export interface WellEvaluationInput {
  wellId: string;
  findings: Finding[];
  labels: LabelledWindow[];
  /** End of the data, ms: stands in for open (null) ends. */
  dataEnd: number;
}

export interface RuleScore {
  rule: RuleKey;
  truePositives: number;
  falsePositives: number;
  falseNegatives: number;
  precision: number;
  recall: number;
  /** Onset errors of detected labels, minutes. */
  onsetErrorsMin: number[];
  meanOnsetErrorMin: number;
  medianOnsetErrorMin: number;
}

export interface EvaluationResult {
  rules: Record<RuleKey, RuleScore>;
  /** Wells with only confounder (or no) labels that still got a finding other than data quality. */
  confounderAlarms: { wellId: string; rule: RuleKey; start: number }[];
}

export function evaluateFindings(wells: WellEvaluationInput[], slackMs = 60 * 60_000): EvaluationResult {
  const rules = Object.fromEntries(RULE_KEYS.map((r) => [r, { tp: 0, fp: 0, fn: 0, errors: [] as number[] }])) as Record<RuleKey, { tp: number; fp: number; fn: number; errors: number[] }>;
  const confounderAlarms: EvaluationResult["confounderAlarms"] = [];
  for (const w of wells) {
    const end = (x: number | null) => x ?? w.dataEnd;
    const overlaps = (f: Finding, l: LabelledWindow) => f.start <= end(l.end) + slackMs && end(f.end) >= l.start - slackMs;
    for (const rule of RULE_KEYS) {
      const labels = w.labels.filter((l) => l.kind === rule);
      const findings = w.findings.filter((f) => f.rule === rule);
      for (const l of labels) {
        const hit = findings.filter((f) => overlaps(f, l)).sort((a, b) => a.start - b.start)[0];
        if (hit) {
          rules[rule].tp++;
          rules[rule].errors.push(Math.abs(hit.start - l.start) / 60_000);
        } else rules[rule].fn++;
      }
      for (const f of findings) if (!labels.some((l) => overlaps(f, l))) rules[rule].fp++;
    }
    const isConfounderOnly = w.labels.every((l) => ["kickoff", "setpoint_change", "pad_outage"].includes(l.kind));
    if (isConfounderOnly) {
      for (const f of w.findings) if (f.rule !== "data_quality") confounderAlarms.push({ wellId: w.wellId, rule: f.rule, start: f.start });
    }
  }
  const scores = Object.fromEntries(RULE_KEYS.map((rule) => {
    const r = rules[rule];
    const detected = r.tp;
    const sorted = [...r.errors].sort((a, b) => a - b);
    const score: RuleScore = {
      rule,
      truePositives: r.tp,
      falsePositives: r.fp,
      falseNegatives: r.fn,
      // Precision counts findings: every false alarm against every label detected.
      precision: detected + r.fp === 0 ? 1 : detected / (detected + r.fp),
      recall: detected + r.fn === 0 ? 1 : detected / (detected + r.fn),
      onsetErrorsMin: r.errors,
      meanOnsetErrorMin: sorted.length ? sorted.reduce((a, b) => a + b, 0) / sorted.length : NaN,
      medianOnsetErrorMin: sorted.length ? (sorted.length % 2 ? sorted[sorted.length >> 1] : (sorted[sorted.length / 2 - 1] + sorted[sorted.length / 2]) / 2) : NaN,
    };
    return [rule, score];
  })) as Record<RuleKey, RuleScore>;
  return { rules: scores, confounderAlarms };
}

/** The per-rule confusion table as fixed-width text. */
export function formatEvaluationTable(result: EvaluationResult): string {
  const head = "rule              TP   FP   FN  precision  recall  mean onset err (min)  median (min)";
  const rows = RULE_KEYS.map((k) => {
    const r = result.rules[k];
    return `${k.padEnd(16)} ${String(r.truePositives).padStart(3)}  ${String(r.falsePositives).padStart(3)}  ${String(r.falseNegatives).padStart(3)}  ${r.precision.toFixed(2).padStart(9)}  ${r.recall.toFixed(2).padStart(6)}  ${(Number.isFinite(r.meanOnsetErrorMin) ? r.meanOnsetErrorMin.toFixed(0) : "-").padStart(20)}  ${(Number.isFinite(r.medianOnsetErrorMin) ? r.medianOnsetErrorMin.toFixed(0) : "-").padStart(12)}`;
  });
  return [head, ...rows].join("\n");
}
