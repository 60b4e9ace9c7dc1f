/**
 * A circular pipe partly full of water (derived; the same closed forms appear in hydraulics
 * handbooks). r = water depth / diameter, theta = 2 arccos(1 - 2r) the angle the water surface
 * subtends at the centre.
 */
const clampRatio = (r: number): number => Math.min(1, Math.max(0, r));

export const centralAngle = (depthRatio: number): number => 2 * Math.acos(1 - 2 * clampRatio(depthRatio));

/** Share of the cross-section under water: (theta - sin theta) / (2 pi). */
export function areaFraction(depthRatio: number): number {
  const t = centralAngle(depthRatio);
  return (t - Math.sin(t)) / (2 * Math.PI);
}

/** Wetted perimeter over diameter, P/D = theta / 2. */
export const wettedPerimeterRatio = (depthRatio: number): number => centralAngle(depthRatio) / 2;

/** Hydraulic radius over diameter, R/D = (1 - sin theta / theta) / 4; 0 for an empty pipe. */
export function hydraulicRadiusRatio(depthRatio: number): number {
  const t = centralAngle(depthRatio);
  if (t === 0) return 0;
  return (1 - Math.sin(t) / t) / 4;
}

/** Share of the cross-section a sag's standing water fills, in percent, from the water depth in percent. */
export const areaFilledPct = (waterDepthPct: number): number => 100 * areaFraction(waterDepthPct / 100);
