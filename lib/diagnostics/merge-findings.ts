// Overlapping or touching findings of one rule become one: the union window, the
// stronger finding's words and numbers, the larger production at risk.
import type { Finding } from "@/lib/diagnostics/types";

/** Merge findings of the same rule whose windows overlap or lie within `joinMs` of each other. */
export function mergeFindings(findings: Finding[], joinMs = 30 * 60_000): Finding[] {
  const byRule = new Map<string, Finding[]>();
  for (const f of findings) byRule.set(f.rule, [...(byRule.get(f.rule) ?? []), f]);
  const out: Finding[] = [];
  for (const list of byRule.values()) {
    list.sort((a, b) => a.start - b.start);
    let cur: Finding | null = null;
    for (const f of list) {
      if (cur && (cur.end === null || f.start <= cur.end + joinMs)) {
        cur = combine(cur, f);
      } else {
        if (cur) out.push(cur);
        cur = f;
      }
    }
    if (cur) out.push(cur);
  }
  return out.sort((a, b) => a.start - b.start || a.rule.localeCompare(b.rule));
}

function combine(a: Finding, b: Finding): Finding {
  const strong = b.severity > a.severity ? b : a;
  const end = a.end === null || b.end === null ? null : Math.max(a.end, b.end);
  return {
    ...strong,
    start: Math.min(a.start, b.start),
    end,
    severity: Math.max(a.severity, b.severity),
    confidence: Math.max(a.confidence, b.confidence),
    evidence: a.rule === "data_quality" ? [...a.evidence, ...b.evidence] : strong.evidence,
    annotations: { ...strong.annotations, windows: [...a.annotations.windows, ...b.annotations.windows] },
    productionAtRisk: a.productionAtRisk.value >= b.productionAtRisk.value ? a.productionAtRisk : b.productionAtRisk,
  };
}
