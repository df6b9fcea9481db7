// Run every rule on one well: prepare the series once (bins, valve levels, quiet
// masks from field events, shut-ins, kick-offs and setpoint changes), run the
// rules, drop anything that starts inside a field event, merge overlaps per rule.
import type { DiagnosisInput, Finding, RuleKey } from "@/lib/diagnostics/types";
import { prepareWell, type PreparedWell } from "@/lib/diagnostics/prepare-well";
import { mergeFindings } from "@/lib/diagnostics/merge-findings";
import { detectMultipointing } from "@/lib/diagnostics/rules/multipointing";
import { detectHeading } from "@/lib/diagnostics/rules/heading";
import { detectValveLeak } from "@/lib/diagnostics/rules/valve-leak";
import { detectLiquidLoading } from "@/lib/diagnostics/rules/liquid-loading";
import { detectFracHit } from "@/lib/diagnostics/rules/frac-hit";
import { detectOverInjection } from "@/lib/diagnostics/rules/over-injection";
import { detectFastKickoff } from "@/lib/diagnostics/rules/fast-kickoff";
import { detectDataQuality } from "@/lib/diagnostics/rules/data-quality";

type Rule = (input: DiagnosisInput, prepared?: PreparedWell) => Finding[];

export const RULES: Record<RuleKey, Rule> = {
  multipointing: detectMultipointing,
  heading: detectHeading,
  valve_leak: detectValveLeak,
  liquid_loading: detectLiquidLoading,
  frac_hit: detectFracHit,
  over_injection: detectOverInjection,
  fast_kickoff: detectFastKickoff,
  data_quality: detectDataQuality,
};

export interface DiagnoseOptions {
  /** Only these rules (default: all). */
  rules?: RuleKey[];
}

export function diagnoseWell(input: DiagnosisInput, options: DiagnoseOptions = {}): Finding[] {
  if (input.series.t.length < 2) return [];
  const prepared = prepareWell(input);
  const keys = options.rules ?? (Object.keys(RULES) as RuleKey[]);
  const events = input.context?.fieldEvents ?? [];
  const raw: Finding[] = [];
  for (const key of keys) {
    for (const f of RULES[key](input, prepared)) {
      // A well issue that begins inside a field event belongs to the event, not the well.
      if (events.some((e) => f.start >= e.start && f.start < e.end)) continue;
      raw.push(f);
    }
  }
  return mergeFindings(dropExplained(raw));
}

/**
 * A frac hit loads the well up (DOMAIN.md §1): liquid loading that begins inside a
 * frac-hit window is part of that event, so the more specific finding stands alone.
 */
function dropExplained(findings: Finding[]): Finding[] {
  const fracs = findings.filter((f) => f.rule === "frac_hit");
  if (!fracs.length) return findings;
  return findings.filter((f) => f.rule !== "liquid_loading" || !fracs.some((h) => f.start >= h.start && f.start <= (h.end ?? Infinity)));
}
