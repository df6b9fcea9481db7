import { describe, expect, it } from "vitest";
import { evaluateFindings } from "@/lib/diagnostics/evaluate";
import type { Finding } from "@/lib/diagnostics/types";

const H = 3_600_000;
const f = (rule: Finding["rule"], start: number, end: number | null): Finding => ({
  rule, start, end, severity: 50, confidence: 0.7, evidence: [], summary: "", annotations: { windows: [], levels: [] },
  productionAtRisk: { value: 0, unit: "bbl/d", method: "test" },
});

describe("evaluateFindings", () => {
  it("counts overlap hits, misses, false alarms and onset error", () => {
    const r = evaluateFindings([
      { wellId: "a", dataEnd: 100 * H, labels: [{ kind: "heading", start: 10 * H, end: 20 * H }, { kind: "valve_leak", start: 50 * H, end: null }], findings: [f("heading", 10.5 * H, 19 * H), f("multipointing", 70 * H, null)] },
      { wellId: "b", dataEnd: 100 * H, labels: [{ kind: "kickoff", start: 5 * H, end: 8 * H }], findings: [f("valve_leak", 6 * H, null)] },
    ]);
    expect(r.rules.heading).toMatchObject({ truePositives: 1, falsePositives: 0, falseNegatives: 0, meanOnsetErrorMin: 30 });
    expect(r.rules.valve_leak).toMatchObject({ truePositives: 0, falsePositives: 1, falseNegatives: 1, precision: 0, recall: 0 });
    expect(r.rules.multipointing.falsePositives).toBe(1);
    expect(r.confounderAlarms).toEqual([{ wellId: "b", rule: "valve_leak", start: 6 * H }]);
  });
});
