// Tunable detection settings, one group per rule. The sources in DOMAIN.md §4
// describe the physics of each signature, not detection thresholds: every number
// below is Bellows' own documented default, chosen on synthetic tuning seeds and
// meant to be tuned per organization, field and well (mergeSettings).
import { z } from "zod";

const minutes = (d: number) => z.number().int().positive().default(d);
const positive = (d: number) => z.number().positive().default(d);
const fraction = (d: number) => z.number().min(0).max(1).default(d);

export const RuleSettingsSchema = z.object({
  general: z
    .object({
      /** Rules read 10-minute bins (median, min, max) rather than raw minutes: fast and robust to noise. */
      binMinutes: minutes(10),
      /** Baseline of "the well's own normal": the median of this much data before an onset. */
      baselineMinutes: minutes(1440),
      /**
       * Flowing tubing gradient for valve opening pressures and port capacities, psi/ft.
       * 0.1 sits inside the 0.08–0.15 usual above the injection point of a gas-lifted
       * column (common practice); lib/gaslift takes it as an option.
       */
      tubingGradientPsiPerFt: positive(0.1),
    })
    .prefault({}),
  fieldEvents: z
    .object({
      /** A well is "out" when injection falls below this fraction of its own median. */
      outageFraction: fraction(0.25),
      /** Share of a pad's wells that must be out at once for a field event. */
      minWellFraction: fraction(0.6),
      minWells: z.number().int().min(2).default(2),
      minDurationMinutes: minutes(30),
      /** Masked after the outage while casing pressure and rates come back. */
      recoveryMinutes: minutes(480),
      /** Masked before the outage (onsets are not perfectly simultaneous). */
      leadMinutes: minutes(30),
    })
    .prefault({}),
  setpointChange: z
    .object({
      /** A clean injection step of at least this fraction of the prior level. */
      minStepFraction: fraction(0.12),
      /** Rules that read casing-pressure steps skip this long around a setpoint change. */
      maskBeforeMinutes: minutes(60),
      maskAfterMinutes: minutes(360),
    })
    .prefault({}),
  kickoff: z
    .object({
      /** Injection off (below fieldEvents.outageFraction of usual) at least this long is a shut-in, not a blip. */
      minShutInMinutes: minutes(60),
      /** A kick-off starts when casing pressure climbs this far from a low level with injection coming on. */
      minCasingRisePsi: positive(150),
      /** ...and ends once casing pressure holds inside this range for settleMinutes. */
      settleRangePsi: positive(12),
      settleMinutes: minutes(120),
      maxMinutes: minutes(2160),
    })
    .prefault({}),
  multipointing: z
    .object({
      /** Casing pressure within this of an unloading valve's surface closing pressure, or above the lowest one. */
      levelTolerancePsi: positive(15),
      /** Sawtooth: RMS of casing pressure about its 30-min moving median. */
      minRoughnessPsi: positive(3),
      minDurationMinutes: minutes(180),
      /** Injection above this multiple of one port's Thornhill–Craver capacity is extra evidence. */
      capacityTolerance: positive(1.1),
    })
    .prefault({}),
  heading: z
    .object({
      windowMinutes: minutes(480),
      stepMinutes: minutes(60),
      minPeriodMinutes: minutes(20),
      maxPeriodMinutes: minutes(240),
      /** Autocorrelation at the dominant period. */
      minAutocorrelation: fraction(0.4),
      /** Tubing-pressure standard deviation over its mean. */
      minRelativeAmplitude: positive(0.05),
      minDurationMinutes: minutes(240),
    })
    .prefault({}),
  valveLeak: z
    .object({
      minDropPsi: positive(35),
      /** Levels compared before and after a step. */
      compareMinutes: minutes(120),
      /** A step, not a drift: the drop happens within this. */
      maxTransitionMinutes: minutes(30),
      minDurationMinutes: minutes(240),
      /** Injection must not have fallen by more than this (else it is a setpoint or supply change). */
      maxInjectionDropFraction: fraction(0.05),
    })
    .prefault({}),
  liquidLoading: z
    .object({
      /** Produced gas below this multiple of the Turner critical rate. */
      criticalRateFactor: positive(1),
      /** Liquid below the baseline by at least this fraction. */
      minLiquidDropFraction: fraction(0.15),
      minDurationMinutes: minutes(180),
    })
    .prefault({}),
  fracHit: z
    .object({
      minTubingRisePsi: positive(40),
      minTubingRiseFraction: positive(0.25),
      compareMinutes: minutes(120),
      maxTransitionMinutes: minutes(30),
      /** Cleared when tubing pressure is back within this fraction of its pre-event level. */
      recoveryFraction: fraction(0.15),
      minDurationMinutes: minutes(60),
    })
    .prefault({}),
  overInjection: z
    .object({
      minInjectionRiseFraction: fraction(0.2),
      /** (Δliquid/liquid)/(Δinjection/injection) below this: more gas buys no more liquid. */
      maxLiquidElasticity: positive(0.1),
      compareMinutes: minutes(360),
      minDurationMinutes: minutes(720),
    })
    .prefault({}),
  fastKickoff: z
    .object({
      rampWindowMinutes: minutes(10),
      /** [memory] DOMAIN.md §1: about 50 psi per 10 min until the top valve is uncovered... */
      limitBeforeTopValvePsi: positive(50),
      /** ...then about 100 psi per 10 min. */
      limitAfterTopValvePsi: positive(100),
    })
    .prefault({}),
  dataQuality: z
    .object({
      flatlineMinutes: minutes(240),
      gapMinutes: minutes(120),
      /** A reading this many robust (MAD) standard deviations from its hour's median is a spike. */
      spikeRobustZ: positive(12),
      spikesPerDay: z.number().int().positive().default(3),
      maxPressurePsig: positive(10_000),
      maxRate: positive(100_000),
    })
    .prefault({}),
});

export type RuleSettings = z.infer<typeof RuleSettingsSchema>;
export type RuleSettingsInput = z.input<typeof RuleSettingsSchema>;

/** Partial overrides at any level: each group and each number is optional. */
export type RuleSettingsOverride = {
  [G in keyof RuleSettings]?: Partial<RuleSettings[G]>;
};

export const DEFAULT_SETTINGS: RuleSettings = RuleSettingsSchema.parse({});

/**
 * Organization → field → well cascade: a later level overrides an earlier one
 * number by number, and anything unset falls back to the documented default.
 */
export function mergeSettings(
  org?: RuleSettingsOverride | null,
  field?: RuleSettingsOverride | null,
  well?: RuleSettingsOverride | null,
): RuleSettings {
  const merged: Record<string, Record<string, unknown>> = {};
  for (const level of [org, field, well]) {
    if (!level) continue;
    for (const [group, values] of Object.entries(level)) {
      if (!values) continue;
      merged[group] = { ...(merged[group] ?? {}), ...stripUndefined(values) };
    }
  }
  return RuleSettingsSchema.parse(merged);
}

function stripUndefined(values: object): Record<string, unknown> {
  return Object.fromEntries(Object.entries(values).filter(([, v]) => v !== undefined));
}
