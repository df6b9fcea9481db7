import { describe, expect, it } from "vitest";
import { mergeFindings } from "@/lib/diagnostics/merge-findings";
import type { Finding } from "@/lib/diagnostics/types";

const f = (rule: Finding["rule"], start: number, end: number | null, severity = 50): Finding => ({
  rule, start, end, severity, confidence: 0.7, evidence: [], summary: "", annotations: { windows: [{ start, end: end ?? start, label: "" }], levels: [] },
  productionAtRisk: { value: severity, unit: "bbl/d", method: "test" },
});

describe("mergeFindings", () => {
  it("joins overlapping findings of one rule and keeps other rules apart", () => {
    const out = mergeFindings([f("heading", 0, 100), f("heading", 50, 200, 70), f("valve_leak", 60, null)]);
    expect(out.map((x) => [x.rule, x.start, x.end, x.severity])).toEqual([["heading", 0, 200, 70], ["valve_leak", 60, null, 50]]);
  });
  it("an open finding absorbs later ones; distant ones stay separate", () => {
    expect(mergeFindings([f("heading", 0, null), f("heading", 1e9, 2e9)])).toHaveLength(1);
    expect(mergeFindings([f("heading", 0, 10), f("heading", 1e9, 2e9)])).toHaveLength(2);
  });
});
