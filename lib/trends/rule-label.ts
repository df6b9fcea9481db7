// Plain names for the rules' keys and field event kinds, as the chart labels them.
const RULE_LABELS: Record<string, string> = {
  multipointing: "Multipointing",
  heading: "Heading",
  valve_leak: "Valve leak or cut out",
  liquid_loading: "Liquid loading",
  frac_hit: "Frac hit",
  over_injection: "Over-injection",
  fast_kickoff: "Kick-off too fast",
  data_quality: "Data quality",
};

const FIELD_EVENT_LABELS: Record<string, string> = {
  injection_outage: "Pad-wide injection outage",
};

/** "liquid_loading" → "Liquid loading"; unknown keys are spelled out the same way. */
function spellOut(key: string): string {
  const words = key.replace(/[_-]+/g, " ").trim();
  return words.length === 0 ? key : words[0].toUpperCase() + words.slice(1);
}

export function labelRule(rule: string): string {
  return RULE_LABELS[rule] ?? spellOut(rule);
}

export function labelFieldEvent(kind: string): string {
  return FIELD_EVENT_LABELS[kind] ?? spellOut(kind);
}
