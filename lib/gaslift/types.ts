// Plain types shared by the engineering core, the rules and the services.
// All values in canonical oilfield units (see lib/units/units.ts):
// pressures psig, depths ft, temperatures °F, diameters in, rates Mscf/d and bbl/d.

export type ValveKind = "ipo" | "orifice" | "dummy";
export type LiquidType = "oil" | "water" | "condensate";

export interface Mandrel {
  /** 1 = top mandrel. */
  position: number;
  mdFt: number;
  tvdFt: number;
  kind: ValveKind;
  /** Port (or orifice) diameter, in. Null for a dummy. */
  portIn: number | null;
  /** Nominal valve outside diameter, in: 1 or 1.5. Null for orifice and dummy. */
  valveOdIn: number | null;
  /** Bellows area ratio R = Ap/Ab. When null it is derived from port and valve size. */
  rRatio: number | null;
  /** Test-rack opening pressure at 60 °F, psig. Null for orifice and dummy. */
  tropsig: number | null;
}

export interface WellDesign {
  tubingIdIn: number;
  tubingDepthFt: number;
  perfDepthFt: number;
  surfaceTempF: number;
  bottomholeTempF: number;
  /** Injection gas specific gravity (air = 1). */
  gasSg: number;
  liquidType: LiquidType;
  /** API gravity for oil/condensate, or specific gravity for water, as entered. */
  liquidGravity: number;
  /** Fraction 0..1. */
  waterCut: number;
  reservoirPressurePsig: number;
  /** Injection pressure available at surface from the gas-lift system, psig. */
  injectionPressurePsig: number;
  /** Top to bottom. */
  mandrels: Mandrel[];
}
