import { areaFraction, hydraulicRadiusRatio } from "./pipe-section";
import type { Material } from "./vocabulary";

// published: Manning's equation V = (k/n) R^(2/3) S^(1/2), k = 1.486 in feet and seconds, 1 in metres.
export const MANNING_K_US = 1.486;
export const MANNING_K_SI = 1;
export const CFS_TO_GPM = 448.831; // 1 ft3/s = 7.48052 US gal x 60 s

// practice: design values from municipal tables (FHWA-derived): 0.013 for clay, concrete and iron,
// 0.010 for plastic. Chow (1959) gives the ranges; these are the usual design picks.
export const DESIGN_MANNING_N: Record<Material, number> = {
  cast_iron: 0.013,
  ductile_iron: 0.013,
  vitrified_clay: 0.013,
  concrete: 0.013,
  bituminous_fibre: 0.013,
  abs: 0.01,
  pvc: 0.01,
  hdpe: 0.01,
  unknown: 0.013,
};

export interface FlowInput {
  /** Inside diameter in the length unit of k: feet with MANNING_K_US, metres with MANNING_K_SI. */
  diameter: number;
  /** Water depth over diameter, 0..1; 1 for a full pipe. */
  depthRatio: number;
  slope: number;
  n: number;
  k?: number;
}

export function manningVelocity({ diameter, depthRatio, slope, n, k = MANNING_K_US }: FlowInput): number {
  const r = hydraulicRadiusRatio(depthRatio) * diameter;
  return (k / n) * Math.pow(r, 2 / 3) * Math.sqrt(Math.max(0, slope));
}

export function manningFlow(input: FlowInput): number {
  const area = (areaFraction(input.depthRatio) * (Math.PI * input.diameter * input.diameter)) / 4;
  return manningVelocity(input) * area;
}

/** Flow and velocity at a depth as a share of those at half full (n taken constant with depth). */
export function partFullRatios(depthRatio: number): { flow: number; velocity: number } {
  const base = { diameter: 1, slope: 1, n: 1, k: 1 };
  const half = { v: manningVelocity({ ...base, depthRatio: 0.5 }), q: manningFlow({ ...base, depthRatio: 0.5 }) };
  return {
    flow: manningFlow({ ...base, depthRatio }) / half.q,
    velocity: manningVelocity({ ...base, depthRatio }) / half.v,
  };
}

/** Full-pipe capacity in US gallons a minute for a diameter in inches and a slope in ft per ft. */
export function fullFlowGpm(diameterIn: number, slopeFtPerFt: number, n: number): number {
  return manningFlow({ diameter: diameterIn / 12, depthRatio: 1, slope: slopeFtPerFt, n }) * CFS_TO_GPM;
}
