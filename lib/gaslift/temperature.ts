// Temperature along the well: a straight line from the surface temperature at 0 ft
// to a known temperature at a known depth (a constant geothermal gradient; common
// practice in gas-lift design when no flowing temperature survey exists).
//
// This is the static profile. A flowing well is warmer up the hole, so valve
// temperatures from it are low and dome pressures at depth come out slightly low;
// callers with measured or modelled valve temperatures should pass those instead.

/**
 * Linear temperature, °F, at `depthFt` (TVD) between `surfaceF` at 0 ft and `bottomF`
 * at `bottomDepthFt`. Clamped to the surface value above 0 ft; extrapolated below
 * the bottom depth with the same gradient.
 */
export function temperatureAtDepth(surfaceF: number, bottomF: number, bottomDepthFt: number, depthFt: number): number {
  if (!(bottomDepthFt > 0)) throw new RangeError(`bottom depth must be > 0 ft, got ${bottomDepthFt}`);
  const depth = Math.max(0, depthFt);
  return surfaceF + ((bottomF - surfaceF) * depth) / bottomDepthFt;
}
