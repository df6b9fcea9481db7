// Natural-gas properties: pseudo-criticals, compressibility (Z) factor, density.
//
// Pseudo-criticals: Sutton, R.P., "Compressibility Factors for High-Molecular-Weight
// Reservoir Gases", SPE 14265 (1985):
//   T_pc = 169.2 + 349.5·γ − 74.0·γ²  (°R)
//   P_pc = 756.8 − 131.0·γ − 3.6·γ²   (psia)
// Z: Dranchuk & Abou-Kassem, "Calculation of Z Factors for Natural Gases Using
// Equations of State", JCPT 14(3), 1975 (11-constant fit of the Standing–Katz chart),
// and Hall & Yarborough, "A New Equation of State for Z-factor Calculations",
// Oil & Gas Journal, 18 June 1973.
// Neither correction for CO2/H2S (Wichert–Aziz) is applied: injection gas is sweet,
// dry, compressed gas. DOMAIN.md §3 lists the check values.

export const RANKINE_OFFSET = 459.67;

export type ZMethod = "dak" | "hall-yarborough";

export interface PseudoCritical {
  /** Pseudo-critical temperature, °R. */
  tpcR: number;
  /** Pseudo-critical pressure, psia. */
  ppcPsia: number;
}

/** Sutton (1985) pseudo-critical properties of a hydrocarbon gas of specific gravity `gasSg` (air = 1). */
export function suttonPseudoCritical(gasSg: number): PseudoCritical {
  assertGasSg(gasSg);
  return {
    tpcR: 169.2 + 349.5 * gasSg - 74.0 * gasSg * gasSg,
    ppcPsia: 756.8 - 131.0 * gasSg - 3.6 * gasSg * gasSg,
  };
}

// Dranchuk & Abou-Kassem (1975) constants A1..A11.
const A1 = 0.3265, A2 = -1.07, A3 = -0.5339, A4 = 0.01569, A5 = -0.05165, A6 = 0.5475;
const A7 = -0.7361, A8 = 0.1844, A9 = 0.1056, A10 = 0.6134, A11 = 0.721;

/**
 * Dranchuk–Abou-Kassem Z at reduced temperature `tpr` and reduced pressure `ppr`.
 * Published range 1.0 ≤ Tpr ≤ 3.0, 0.2 ≤ Ppr < 30 (it is evaluated outside it too;
 * injection-gas conditions, Tpr ≈ 1.4–1.8 and Ppr < 3, sit well inside).
 */
export function zFactorDak(tpr: number, ppr: number): number {
  assertReduced(tpr, ppr);
  if (ppr === 0) return 1;
  const c1 = A1 + A2 / tpr + A3 / tpr ** 3 + A4 / tpr ** 4 + A5 / tpr ** 5;
  const c2 = A6 + A7 / tpr + A8 / tpr ** 2;
  const c3 = A9 * (A7 / tpr + A8 / tpr ** 2);
  const c4 = A10 / tpr ** 3;
  // Z from the equation of state, as a function of reduced density ρr.
  const zEos = (rho: number) =>
    1 + c1 * rho + c2 * rho ** 2 - c3 * rho ** 5 + c4 * (1 + A11 * rho ** 2) * rho ** 2 * Math.exp(-A11 * rho ** 2);
  const dzEos = (rho: number) => {
    const e = Math.exp(-A11 * rho ** 2);
    return c1 + 2 * c2 * rho - 5 * c3 * rho ** 4
      + c4 * e * (2 * rho + 4 * A11 * rho ** 3 - 2 * A11 * rho * (rho ** 2 + A11 * rho ** 4));
  };
  // ρr = 0.27·Ppr/(Z·Tpr), so solve F(ρ) = Z_eos(ρ)·ρ − 0.27·Ppr/Tpr = 0.
  const target = (0.27 * ppr) / tpr;
  const f = (rho: number) => zEos(rho) * rho - target;
  const df = (rho: number) => zEos(rho) + rho * dzEos(rho);
  const rho = solveMonotoneRoot(f, df, target, 0, 3);
  return target / rho;
}

/**
 * Hall–Yarborough Z at reduced temperature `tpr` and reduced pressure `ppr`.
 * Published range 1.2 ≤ Tpr ≤ 3.0 (the authors advise against Tpr < 1).
 */
export function zFactorHallYarborough(tpr: number, ppr: number): number {
  assertReduced(tpr, ppr);
  if (ppr === 0) return 1;
  const t = 1 / tpr;
  const a = 0.06125 * t * Math.exp(-1.2 * (1 - t) ** 2);
  const x2 = 14.76 * t - 9.76 * t ** 2 + 4.58 * t ** 3;
  const x3 = 90.7 * t - 242.2 * t ** 2 + 42.4 * t ** 3;
  const x4 = 2.18 + 2.82 * t;
  // y is the reduced density; Z = a·Ppr / y.
  const f = (y: number) =>
    -a * ppr + (y + y ** 2 + y ** 3 - y ** 4) / (1 - y) ** 3 - x2 * y ** 2 + x3 * y ** x4;
  const df = (y: number) =>
    (1 + 4 * y + 4 * y ** 2 - 4 * y ** 3 + y ** 4) / (1 - y) ** 4 - 2 * x2 * y + x3 * x4 * y ** (x4 - 1);
  const y = solveMonotoneRoot(f, df, a * ppr, 0, 0.99);
  return (a * ppr) / y;
}

export interface GasZInput {
  pPsia: number;
  tF: number;
  /** Gas specific gravity, air = 1. */
  sg: number;
  /** Default "dak". */
  method?: ZMethod;
}

/** Z factor of a hydrocarbon gas at pressure and temperature, with Sutton pseudo-criticals. */
export function gasZ({ pPsia, tF, sg, method = "dak" }: GasZInput): number {
  if (!(pPsia >= 0)) throw new RangeError(`pressure must be ≥ 0 psia, got ${pPsia}`);
  const { tpcR, ppcPsia } = suttonPseudoCritical(sg);
  const tpr = (tF + RANKINE_OFFSET) / tpcR;
  const ppr = pPsia / ppcPsia;
  return method === "dak" ? zFactorDak(tpr, ppr) : zFactorHallYarborough(tpr, ppr);
}

/**
 * Gas density, lbm/ft³, from the real-gas law ρ = M_air·γ·p/(Z·R·T):
 * 28.9625/10.7316 = 2.699, the "2.7·γ·p/(Z·T)" of petroleum-engineering texts
 * (e.g. Ahmed, *Reservoir Engineering Handbook*, ch. 2). M_air 28.9625 lbm/lbmol,
 * R 10.7316 psia·ft³/(lbmol·°R).
 */
export function gasDensity(pPsia: number, tF: number, sg: number, z: number): number {
  return (28.9625 * sg * pPsia) / (z * 10.7316 * (tF + RANKINE_OFFSET));
}

/**
 * Newton's method on [lo, hi] with a bisection fallback: robust for the
 * single physical root of both Z equations of state in their published ranges.
 */
function solveMonotoneRoot(
  f: (x: number) => number,
  df: (x: number) => number,
  x0: number,
  lo: number,
  hi: number,
): number {
  let a = lo;
  let b = hi;
  // f(lo) < 0 for both equations; move hi up until f(hi) > 0 so the root is bracketed
  // (towards 1 for Hall–Yarborough's y < 1, doubling for DAK's reduced density).
  // Near Tpr 1 the equations can have several roots; the published ranges avoid that.
  while (f(b) < 0 && b < 1e6) b = hi < 1 ? (b + 1) / 2 : b * 2;
  let x = Math.min(Math.max(x0, a), b);
  for (let i = 0; i < 100; i++) {
    const fx = f(x);
    if (Math.abs(fx) < 1e-13) return x;
    if (fx < 0) a = x;
    else b = x;
    const d = df(x);
    let next = x - fx / d;
    if (!Number.isFinite(next) || next <= a || next >= b) next = (a + b) / 2;
    if (Math.abs(next - x) < 1e-14 * Math.max(1, Math.abs(x))) return next;
    x = next;
  }
  return x;
}

function assertGasSg(gasSg: number): void {
  if (!(gasSg > 0.5 && gasSg < 2)) throw new RangeError(`gas specific gravity must be in (0.5, 2), got ${gasSg}`);
}

function assertReduced(tpr: number, ppr: number): void {
  if (!(tpr > 0)) throw new RangeError(`reduced temperature must be > 0, got ${tpr}`);
  if (!(ppr >= 0)) throw new RangeError(`reduced pressure must be ≥ 0, got ${ppr}`);
}
