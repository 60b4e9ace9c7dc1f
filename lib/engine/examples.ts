import type { RecordInput } from "./record";

/**
 * Invented example records for the demo world and the docs. No real inspection, address or
 * person is behind them.
 */

/** A 1950s house: cast iron out of the basement, a PVC patch, then clay to the main; roots, a sag, a fracture. */
export const CLAY_LATERAL_1950S: RecordInput = {
  access: { kind: "cleanout_inside", note: "Basement cleanout by the laundry sink" },
  segments: [
    { from: 0, to: 9, material: "cast_iron", diameterIn: 4 },
    { from: 9, to: 15, material: "pvc", diameterIn: 4 },
    { from: 15, to: 60, material: "vitrified_clay", diameterIn: 4 },
    { from: 60, to: 74, material: "vitrified_clay", diameterIn: 6 },
  ],
  surveyEnd: { at: 74, reason: "reached_main" },
  boundaryAt: 58,
  locates: [
    { at: 12, depthFt: 2.6, groundElevationFt: null, surface: "hardscape" },
    { at: 30, depthFt: 3.3, groundElevationFt: 101.4, surface: "soil" },
    { at: 45, depthFt: 4.2, groundElevationFt: 101.0, surface: "soil" },
    { at: 60, depthFt: 5.4, groundElevationFt: null, surface: "hardscape" },
    { at: 72, depthFt: 6.1, groundElevationFt: null, surface: "street" },
  ],
  findings: [
    { at: 9, type: "offset_joint", grade: 2, clock: "6", note: "Cast iron to PVC coupling, slight drop at the invert" },
    { at: 16.5, type: "roots", grade: 2, clock: "10-2", lossPct: 10, note: "Fine roots at the first clay joint" },
    { at: 19.5, type: "roots", grade: 3, clock: "4-8", lossPct: 25 },
    { at: 24, to: 27, type: "crack", grade: 2, clock: "12" },
    { at: 28.5, type: "roots", grade: 3, clock: "3-9", lossPct: 30, note: "Root mass at the joint" },
    { at: 34, to: 42, type: "sag", grade: 3, waterDepthPct: 30, note: "Camera lens under water for about 3 ft" },
    { at: 44, type: "fracture", grade: 4, clock: "2-5" },
    { at: 47.5, type: "roots", grade: 2, clock: "6", lossPct: 5 },
    { at: 63, type: "offset_joint", grade: 3, clock: "12" },
    { at: 66, to: 70, type: "deposits", grade: 2, lossPct: 10 },
  ],
};

/** A 1990s house on a PVC lateral: a little grease, nothing that needs work. */
export const PVC_LATERAL_1990S: RecordInput = {
  access: { kind: "cleanout_outside", note: "Two-way cleanout by the front steps" },
  segments: [{ from: 0, to: 52, material: "pvc", diameterIn: 4 }],
  surveyEnd: { at: 52, reason: "reached_main" },
  boundaryAt: 41,
  locates: [
    { at: 10, depthFt: 2.0, groundElevationFt: null, surface: "soil" },
    { at: 35, depthFt: 3.1, groundElevationFt: null, surface: "soil" },
    { at: 50, depthFt: 4.0, groundElevationFt: null, surface: "street" },
  ],
  findings: [{ at: 22, to: 30, type: "grease", grade: 2, lossPct: 5, note: "Thin grease film along the invert" }],
};

export const EXAMPLE_RECORDS = { clayLateral1950s: CLAY_LATERAL_1950S, pvcLateral1990s: PVC_LATERAL_1990S } as const;
