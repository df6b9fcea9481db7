// Static gas column in the casing–tubing annulus (no friction, no liquid).
//
//   P_D = P_s · exp(0.01875 · γg · D / (Z̄ · T̄))
//
// P in psia, D true vertical depth in ft, T̄ the mean temperature in °R and Z̄ taken at
// the mean pressure and mean temperature, iterated until it settles (DOMAIN.md §3).
// The constant is M_air/(R·144) = 28.9625/(10.7316·144) = 0.018742, printed as 0.01875:
// the hydrostatic balance dp/dD = ρg/144 with the real-gas density, integrated at
// mean Z and T.
//
// One average step over the whole column is the published hand method and reproduces
// the check values; `segments` splits the column (linear temperature in each) for
// long, hot wells where the single step drifts by a psi or so.
import { ATM_PSI } from "@/lib/units/units";
import { gasZ, RANKINE_OFFSET, type ZMethod } from "@/lib/gaslift/gas-properties";

export const GAS_COLUMN_CONSTANT = 0.01875;

/** The column: gas gravity, vertical depth and the temperatures at its two ends. */
export interface GasColumn {
  /** Gas specific gravity, air = 1. */
  sg: number;
  /** True vertical depth of the point below the surface, ft. */
  depthFt: number;
  surfaceTempF: number;
  depthTempF: number;
  /** Z correlation, default "dak". */
  method?: ZMethod;
  /** Equal-TVD steps; default 1 (the hand method). */
  segments?: number;
}

const TOLERANCE_PSI = 1e-6;
const MAX_ITERATIONS = 100;

/** Pressure at depth, psia, below a surface pressure `surfacePsia`. */
export function gasColumnPressure(input: GasColumn & { surfacePsia: number }): number {
  assertColumn(input.surfacePsia, input);
  let p = input.surfacePsia;
  for (const step of columnSteps(input)) p = stepDown(p, step.lengthFt, step.meanTempF, input);
  return p;
}

/** Pressure at depth, psig, below a surface pressure `surfacePsig` (absolute = gauge + 14.7 psi). */
export function gasColumnPressurePsig(input: GasColumn & { surfacePsig: number }): number {
  return gasColumnPressure({ ...input, surfacePsia: input.surfacePsig + ATM_PSI }) - ATM_PSI;
}

/**
 * Surface pressure, psia, that gives `depthPsia` at depth: the inverse of
 * `gasColumnPressure`. Refers a valve's pressure at depth to the surface.
 */
export function surfacePressureForDepth(input: GasColumn & { depthPsia: number }): number {
  assertColumn(input.depthPsia, input);
  let p = input.depthPsia;
  for (const step of columnSteps(input).reverse()) p = stepUp(p, step.lengthFt, step.meanTempF, input);
  return p;
}

/** Surface pressure, psig, that gives `depthPsig` at depth. */
export function surfacePressureForDepthPsig(input: GasColumn & { depthPsig: number }): number {
  return surfacePressureForDepth({ ...input, depthPsia: input.depthPsig + ATM_PSI }) - ATM_PSI;
}

/**
 * Hand rule of thumb, P_D ≈ P_s · (1 + D/40,000), pressures absolute (DOMAIN.md §3,
 * published). A cross-check for the full calculation, not a substitute.
 */
export function gasColumnRuleOfThumb(surfacePsia: number, depthFt: number): number {
  return surfacePsia * (1 + depthFt / 40_000);
}

function columnSteps(input: GasColumn): { lengthFt: number; meanTempF: number }[] {
  const n = input.segments ?? 1;
  const tempAt = (f: number) => input.surfaceTempF + (input.depthTempF - input.surfaceTempF) * f;
  return Array.from({ length: n }, (_, i) => ({
    lengthFt: input.depthFt / n,
    meanTempF: (tempAt(i / n) + tempAt((i + 1) / n)) / 2,
  }));
}

function exponent(column: GasColumn, lengthFt: number, meanTempF: number, z: number): number {
  return (GAS_COLUMN_CONSTANT * column.sg * lengthFt) / (z * (meanTempF + RANKINE_OFFSET));
}

function stepDown(pTop: number, lengthFt: number, meanTempF: number, column: GasColumn): number {
  let pBottom = pTop * Math.exp(exponent(column, lengthFt, meanTempF, 1));
  for (let i = 0; i < MAX_ITERATIONS; i++) {
    const z = gasZ({ pPsia: (pTop + pBottom) / 2, tF: meanTempF, sg: column.sg, method: column.method });
    const next = pTop * Math.exp(exponent(column, lengthFt, meanTempF, z));
    if (Math.abs(next - pBottom) < TOLERANCE_PSI) return next;
    pBottom = next;
  }
  return pBottom;
}

function stepUp(pBottom: number, lengthFt: number, meanTempF: number, column: GasColumn): number {
  let pTop = pBottom / Math.exp(exponent(column, lengthFt, meanTempF, 1));
  for (let i = 0; i < MAX_ITERATIONS; i++) {
    const z = gasZ({ pPsia: (pTop + pBottom) / 2, tF: meanTempF, sg: column.sg, method: column.method });
    const next = pBottom / Math.exp(exponent(column, lengthFt, meanTempF, z));
    if (Math.abs(next - pTop) < TOLERANCE_PSI) return next;
    pTop = next;
  }
  return pTop;
}

function assertColumn(pPsia: number, column: GasColumn): void {
  if (!(pPsia >= 0)) throw new RangeError(`pressure must be ≥ 0 psia, got ${pPsia}`);
  if (!(column.depthFt >= 0)) throw new RangeError(`depth must be ≥ 0 ft, got ${column.depthFt}`);
  const n = column.segments ?? 1;
  if (!(Number.isInteger(n) && n >= 1)) throw new RangeError(`segments must be a positive integer, got ${n}`);
}
