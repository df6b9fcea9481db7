// Plain-words titles and descriptions of every rule setting, for the rule settings
// page. The numbers themselves (and their defaults) come from the engine's
// RuleSettingsSchema and the issue lifecycle schema; this file only explains them.
export interface SettingHelp {
  label: string;
  unit: string;
  text: string;
}

export interface GroupHelp {
  title: string;
  text: string;
  settings: Record<string, SettingHelp>;
}

const min = "min";

export const RULE_SETTINGS_HELP: Record<string, GroupHelp> = {
  general: {
    title: "All rules",
    text: "How every rule reads the trends.",
    settings: {
      binMinutes: { label: "Bin length", unit: min, text: "Rules read the median, low and high of each bin instead of raw minutes: faster and less fooled by noise." },
      baselineMinutes: { label: "Baseline length", unit: min, text: "The well's own normal is the median of this much data before a change." },
      tubingGradientPsiPerFt: { label: "Flowing tubing gradient", unit: "psi/ft", text: "Used for valve opening pressures and port capacities. 0.08–0.15 is usual above the injection point." },
    },
  },
  fieldEvents: {
    title: "Pad-wide outages",
    text: "When most wells on a pad lose injection at once it is a supply problem, reported once as a field event, not as an issue on each well.",
    settings: {
      outageFraction: { label: "Out below", unit: "× usual", text: "A well counts as out when its injection falls below this fraction of its own median." },
      minWellFraction: { label: "Share of pad out", unit: "fraction", text: "Share of the pad's wells that must be out together." },
      minWells: { label: "Wells out, at least", unit: "wells", text: "And at least this many wells." },
      minDurationMinutes: { label: "Lasting at least", unit: min, text: "Shorter dips are ignored." },
      recoveryMinutes: { label: "Recovery time", unit: min, text: "Rules stay quiet this long after the outage while pressures and rates come back." },
      leadMinutes: { label: "Lead time", unit: min, text: "Rules stay quiet this long before it, since wells do not drop at exactly the same minute." },
    },
  },
  setpointChange: {
    title: "Injection setpoint changes",
    text: "A clean step in injection is a planned change, not a well problem.",
    settings: {
      minStepFraction: { label: "Smallest step", unit: "× prior rate", text: "A step at least this large, relative to the rate before it, counts as a setpoint change." },
      maskBeforeMinutes: { label: "Quiet before", unit: min, text: "Rules that read casing-pressure steps skip this long before the change." },
      maskAfterMinutes: { label: "Quiet after", unit: min, text: "…and this long after it." },
    },
  },
  kickoff: {
    title: "Kick-offs",
    text: "A normal kick-off steps casing pressure down valve by valve; rules stay quiet during it.",
    settings: {
      minShutInMinutes: { label: "Shut-in, at least", unit: min, text: "Injection off this long is a shut-in, not a blip." },
      minCasingRisePsi: { label: "Casing rise", unit: "psi", text: "A kick-off starts when casing pressure climbs this far from a low level with injection coming on." },
      settleRangePsi: { label: "Settled within", unit: "psi", text: "It ends once casing pressure stays inside this range…" },
      settleMinutes: { label: "Settled for", unit: min, text: "…for this long." },
      maxMinutes: { label: "Longest kick-off", unit: min, text: "A kick-off is never taken to last longer than this." },
    },
  },
  multipointing: {
    title: "Multipointing",
    text: "Gas passing through more than one valve: casing pressure at an upper valve's closing pressure, with a sawtooth.",
    settings: {
      levelTolerancePsi: { label: "Near a valve level", unit: "psi", text: "Casing pressure within this of an unloading valve's surface closing pressure." },
      minRoughnessPsi: { label: "Sawtooth size", unit: "psi", text: "Scatter of casing pressure about its 30-minute moving median." },
      minDurationMinutes: { label: "Lasting at least", unit: min, text: "Shorter spells are ignored." },
      capacityTolerance: { label: "Port capacity margin", unit: "×", text: "Injection above this multiple of what one port passes is extra evidence." },
    },
  },
  heading: {
    title: "Heading",
    text: "Regular cycles in tubing pressure and produced gas.",
    settings: {
      windowMinutes: { label: "Window", unit: min, text: "Length of data searched for a cycle." },
      stepMinutes: { label: "Step", unit: min, text: "How far the window moves each time." },
      minPeriodMinutes: { label: "Shortest period", unit: min, text: "Cycles faster than this are noise." },
      maxPeriodMinutes: { label: "Longest period", unit: min, text: "Slower swings are drift, not heading." },
      minAutocorrelation: { label: "Regularity", unit: "0–1", text: "Autocorrelation at the cycle's period: how alike one cycle is to the next." },
      minRelativeAmplitude: { label: "Swing size", unit: "× mean", text: "Tubing-pressure standard deviation over its mean." },
      minDurationMinutes: { label: "Lasting at least", unit: min, text: "Shorter spells are ignored." },
    },
  },
  valveLeak: {
    title: "Valve stuck open or leaking",
    text: "A step drop in casing pressure below the design operating pressure that does not come back.",
    settings: {
      minDropPsi: { label: "Smallest drop", unit: "psi", text: "Casing pressure must fall at least this much." },
      compareMinutes: { label: "Compare over", unit: min, text: "Levels before and after the step are medians of this long." },
      maxTransitionMinutes: { label: "Step within", unit: min, text: "A step, not a drift: the drop happens within this time." },
      minDurationMinutes: { label: "Lasting at least", unit: min, text: "Shorter spells are ignored." },
      maxInjectionDropFraction: { label: "Injection steady within", unit: "fraction", text: "If injection fell more than this, it is a supply or setpoint change instead." },
    },
  },
  liquidLoading: {
    title: "Liquid loading",
    text: "Produced gas too slow to carry liquid (below the Turner critical rate) while liquid falls.",
    settings: {
      criticalRateFactor: { label: "Critical rate factor", unit: "×", text: "Produced gas below this multiple of the critical rate." },
      minLiquidDropFraction: { label: "Liquid drop", unit: "fraction", text: "Liquid below its baseline by at least this share." },
      minDurationMinutes: { label: "Lasting at least", unit: min, text: "Shorter spells are ignored." },
    },
  },
  fracHit: {
    title: "Frac hit",
    text: "An abrupt rise in tubing pressure from an offset fracture, then a slow recovery.",
    settings: {
      minTubingRisePsi: { label: "Tubing rise", unit: "psi", text: "Tubing pressure rises at least this much…" },
      minTubingRiseFraction: { label: "Tubing rise share", unit: "fraction", text: "…and at least this share of its level before." },
      compareMinutes: { label: "Compare over", unit: min, text: "Levels before and after are medians of this long." },
      maxTransitionMinutes: { label: "Rise within", unit: min, text: "The rise happens within this time." },
      recoveryFraction: { label: "Recovered within", unit: "fraction", text: "Cleared once tubing pressure is back within this share of its earlier level." },
      minDurationMinutes: { label: "Lasting at least", unit: min, text: "Shorter spells are ignored." },
    },
  },
  overInjection: {
    title: "Over-injection",
    text: "More injection gas that buys no more liquid.",
    settings: {
      minInjectionRiseFraction: { label: "Injection rise", unit: "fraction", text: "Injection up by at least this share." },
      maxLiquidElasticity: { label: "Liquid response below", unit: "ratio", text: "Relative liquid change over relative injection change below this." },
      compareMinutes: { label: "Compare over", unit: min, text: "Levels before and after are medians of this long." },
      minDurationMinutes: { label: "Lasting at least", unit: min, text: "Shorter spells are ignored." },
    },
  },
  fastKickoff: {
    title: "Kick-off too fast",
    text: "Casing pressure rising faster than a safe unloading ramp (valve seats can be cut out).",
    settings: {
      rampWindowMinutes: { label: "Ramp window", unit: min, text: "The rise is measured over this window." },
      limitBeforeTopValvePsi: { label: "Limit before top valve", unit: "psi/window", text: "Allowed rise until the top valve is uncovered (about 50 psi per 10 min, from memory)." },
      limitAfterTopValvePsi: { label: "Limit after top valve", unit: "psi/window", text: "Allowed rise afterwards (about 100 psi per 10 min, from memory)." },
    },
  },
  dataQuality: {
    title: "Data quality",
    text: "Flatlined tags, gaps, spikes and impossible values.",
    settings: {
      flatlineMinutes: { label: "Flatline after", unit: min, text: "A value that does not move for this long." },
      gapMinutes: { label: "Gap after", unit: min, text: "No reading for this long." },
      spikeRobustZ: { label: "Spike size", unit: "robust SD", text: "A reading this many robust standard deviations from its hour's median." },
      spikesPerDay: { label: "Spikes per day", unit: "count", text: "More spikes than this in a day raise an issue." },
      maxPressurePsig: { label: "Highest believable pressure", unit: "psig", text: "Anything above is impossible." },
      maxRate: { label: "Highest believable rate", unit: "Mscf/d or bbl/d", text: "Anything above is impossible." },
    },
  },
  lifecycle: {
    title: "Issue lifecycle",
    text: "How findings become issues over time, so issues do not flicker open and shut.",
    settings: {
      closeAfterMinutes: { label: "Ended after", unit: min, text: "An issue is marked ended once its signature has been absent this long." },
      quietGapMinutes: { label: "Quiet gap", unit: min, text: "A dismissed issue's signature returning within this gap extends it instead of opening a new issue." },
      resolveGraceMinutes: { label: "Grace after resolved", unit: min, text: "Signature seen up to this long after 'resolved' is the tail of the old episode, not a return." },
      verifyAfterMinutes: { label: "Verified after", unit: min, text: "A resolved issue is verified when its signature stays away this long (in data)." },
      recurrenceWindowDays: { label: "Recurrence window", unit: "days", text: "A return within this after 'resolved' marks the issue recurred; later it is a new issue." },
    },
  },
};

export const RULE_GROUP_OF: Record<string, string> = {
  multipointing: "multipointing",
  heading: "heading",
  valve_leak: "valveLeak",
  liquid_loading: "liquidLoading",
  frac_hit: "fracHit",
  over_injection: "overInjection",
  fast_kickoff: "fastKickoff",
  data_quality: "dataQuality",
};
