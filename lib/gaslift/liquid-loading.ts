// Liquid loading: the gas velocity below which droplets fall back and liquid
// accumulates. DOMAIN.md §3.
//
// Turner, Hubbard & Dukler, "Analysis and Prediction of Minimum Flow Rate for the
// Continuous Removal of Liquids from Gas Wells", JPT, Nov 1969, including their
// 20 % upward adjustment:
//   v_c = 1.912·σ^¼·(ρL − ρg)^¼ / ρg^½      (σ dyn/cm, ρ lbm/ft³, v_c ft/s)
// Coleman, Clay, McCurdy & Norris, "A New Look at Predicting Gas-Well Load-Up",
// JPT, Mar 1991: the same form with 1.593 and no adjustment. (Several open-source
// codes call 1.593 "Turner"; it is not.)
// Critical rate: q_c [MMscf/d] = 3.06·p·A·v_c/(T·Z), A in ft², T in °R, p in psia.
// Field forms [memory, Lea et al., *Gas Well Deliquification*, 2nd ed.] take
// ρg ≈ 0.0031·p with water at σ 60 dyn/cm, ρL 67 lbm/ft³ and condensate at
// σ 20 dyn/cm, ρL 45 lbm/ft³; 1.912·60^¼ = 5.321 and 1.912·20^¼ = 4.043 recover
// their constants.
import { RANKINE_OFFSET } from "@/lib/gaslift/gas-properties";

export type LoadingModel = "turner" | "coleman";
export type LoadingLiquid = "water" | "condensate";

export const LOADING_COEFFICIENT: Record<LoadingModel, number> = { turner: 1.912, coleman: 1.593 };

/** Field-form liquid properties (Lea et al., from memory; see header). */
export const FIELD_LIQUID: Record<LoadingLiquid, { surfaceTensionDynCm: number; densityLbmFt3: number }> = {
  water: { surfaceTensionDynCm: 60, densityLbmFt3: 67 },
  condensate: { surfaceTensionDynCm: 20, densityLbmFt3: 45 },
};

/** Field approximation of gas density, lbm/ft³: ρg ≈ 0.0031·p (p psia). */
export function fieldGasDensity(pressurePsia: number): number {
  return 0.0031 * pressurePsia;
}

export interface CriticalVelocityInput {
  surfaceTensionDynCm: number;
  liquidDensityLbmFt3: number;
  gasDensityLbmFt3: number;
  model?: LoadingModel;
}

/** Critical (minimum unloading) gas velocity, ft/s. */
export function criticalVelocity(input: CriticalVelocityInput): number {
  const { surfaceTensionDynCm: sigma, liquidDensityLbmFt3: rhoL, gasDensityLbmFt3: rhoG } = input;
  if (!(sigma > 0)) throw new RangeError(`surface tension must be > 0 dyn/cm, got ${sigma}`);
  if (!(rhoG > 0)) throw new RangeError(`gas density must be > 0 lbm/ft³, got ${rhoG}`);
  if (!(rhoL > rhoG)) throw new RangeError(`liquid density (${rhoL}) must exceed gas density (${rhoG})`);
  const c = LOADING_COEFFICIENT[input.model ?? "turner"];
  return (c * sigma ** 0.25 * (rhoL - rhoG) ** 0.25) / Math.sqrt(rhoG);
}

/** Critical velocity, ft/s, by the field form for `liquid` at `pressurePsia`. */
export function fieldCriticalVelocity(pressurePsia: number, liquid: LoadingLiquid, model: LoadingModel = "turner"): number {
  const props = FIELD_LIQUID[liquid];
  return criticalVelocity({
    surfaceTensionDynCm: props.surfaceTensionDynCm,
    liquidDensityLbmFt3: props.densityLbmFt3,
    gasDensityLbmFt3: fieldGasDensity(pressurePsia),
    model,
  });
}

/** Flow area of a pipe of inside diameter `idIn` inches, ft². */
export function flowAreaFt2(idIn: number): number {
  if (!(idIn > 0)) throw new RangeError(`inside diameter must be > 0 in, got ${idIn}`);
  return (Math.PI * (idIn / 12) ** 2) / 4;
}

/** Gas rate, MMscf/d, that moves at `velocityFtS` through area `areaFt2` at p, T, Z: 3.06·p·A·v/(T·Z). */
export function gasRateAtVelocityMmscfd(velocityFtS: number, pressurePsia: number, tempF: number, z: number, areaFt2: number): number {
  return (3.06 * pressurePsia * areaFt2 * velocityFtS) / ((tempF + RANKINE_OFFSET) * z);
}

export interface CriticalRateInput {
  pressurePsia: number;
  tempF: number;
  z: number;
  tubingIdIn: number;
  liquid: LoadingLiquid;
  model?: LoadingModel;
}

/** Critical (minimum unloading) gas rate, Mscf/d (Bellows' canonical gas-rate unit), by the field form. */
export function criticalRateMscfd(input: CriticalRateInput): number {
  const v = fieldCriticalVelocity(input.pressurePsia, input.liquid, input.model);
  return 1000 * gasRateAtVelocityMmscfd(v, input.pressurePsia, input.tempF, input.z, flowAreaFt2(input.tubingIdIn));
}

/** Produced gas rate as a fraction of the critical rate: below 1 the well is liable to load up. */
export function loadingRatio(gasRateMscfd: number, criticalMscfd: number): number {
  if (!(criticalMscfd > 0)) throw new RangeError(`critical rate must be > 0, got ${criticalMscfd}`);
  return gasRateMscfd / criticalMscfd;
}

/**
 * Which field form to apply to a well. Water needs the higher velocity, so any water
 * in the stream governs (the usual reading of Turner et al. 1969, from memory: use
 * water properties whenever water is produced). Oil has no field form of its own; the condensate one is the nearer (our
 * approximation, stated so that a screen can say so).
 */
export function loadingLiquidFor(liquidType: "oil" | "water" | "condensate", waterCut: number): LoadingLiquid {
  return liquidType === "water" || waterCut > 0 ? "water" : "condensate";
}
