import { DESIGN_MANNING_N, fullFlowGpm } from "./flow";
import { segmentsOverlapping, sideAt } from "./geometry";
import type { InspectionRecord, Locate } from "./record";
import { fractionText, inPerFt, minimumSlope, type SlopeRuleSet } from "./slope-rules";
import type { Side, Surface } from "./vocabulary";

export interface GradeBetweenMarks {
  from: number;
  to: number;
  side: Side;
  diameterIn: number;
  depthFromFt: number;
  depthToFt: number;
  /** Fall per foot of run; negative when the pipe runs uphill toward the main. */
  slopeFtPerFt: number;
  inPerFt: number;
  percent: number;
  minimumInPerFt: number;
  minimumText: string;
  meetsMinimum: boolean;
  /** Manning's full-pipe capacity at this grade, US gal/min, with the design n of the pipe's material. */
  fullFlowGpm: number;
  /** True when either mark lacks a ground elevation, so the ground was taken as level. */
  assumedLevelGround: boolean;
  /** Always true: locator depths and counter footages are approximate. */
  estimate: true;
}

/**
 * derived: pipe elevation = ground elevation - depth; grade = (upstream - downstream) / run.
 * With no ground elevations the ground is taken as level, and the grade is just the change of depth.
 * The counter footage stands in for the horizontal run (practice: it reads long around bends,
 * so the grade comes out a little shallow).
 */
export function gradeBetween(up: Locate, down: Locate): { slopeFtPerFt: number; assumedLevelGround: boolean } {
  const level = up.groundElevationFt === null || down.groundElevationFt === null;
  const groundUp = level ? 0 : (up.groundElevationFt ?? 0);
  const groundDown = level ? 0 : (down.groundElevationFt ?? 0);
  const fall = groundUp - up.depthFt - (groundDown - down.depthFt);
  return { slopeFtPerFt: fall / (down.at - up.at), assumedLevelGround: level };
}

export const slopeToInPerFt = (ftPerFt: number): number => ftPerFt * 12;
export const slopeToPercent = (ftPerFt: number): number => ftPerFt * 100;

// Comparing the reading with the code's minimum, not the reading's precision: one part in a
// million only absorbs floating-point noise in an exact 1/8.
const SLOPE_EPSILON = 1e-9;

/** Footage grows downstream: the camera goes in at the house and heads for the main. */
export function gradesBetweenMarks(record: InspectionRecord, rules: SlopeRuleSet): GradeBetweenMarks[] {
  const marks = sortedLocates(record.locates);
  const out: GradeBetweenMarks[] = [];
  for (let i = 1; i < marks.length; i++) {
    const up = marks[i - 1];
    const down = marks[i];
    const { slopeFtPerFt, assumedLevelGround } = gradeBetween(up, down);
    // The smallest pipe between the marks has the strictest minimum slope and the least capacity.
    const segs = segmentsOverlapping(record.segments, up.at, down.at);
    const narrowest = segs.reduce((a, b) => (b.diameterIn < a.diameterIn ? b : a));
    const diameterIn = narrowest.diameterIn;
    const minimum = minimumSlope(rules, diameterIn);
    const slopeIn = slopeToInPerFt(slopeFtPerFt);
    out.push({
      from: up.at,
      to: down.at,
      side: sideAt(up.at, record.boundaryAt),
      diameterIn,
      depthFromFt: up.depthFt,
      depthToFt: down.depthFt,
      slopeFtPerFt,
      inPerFt: slopeIn,
      percent: slopeToPercent(slopeFtPerFt),
      minimumInPerFt: inPerFt(minimum),
      minimumText: `${fractionText(minimum)} in per ft`,
      meetsMinimum: slopeIn * minimum.den >= minimum.num - SLOPE_EPSILON,
      fullFlowGpm: fullFlowGpm(diameterIn, Math.max(0, slopeFtPerFt), DESIGN_MANNING_N[narrowest.material]),
      assumedLevelGround,
      estimate: true,
    });
  }
  return out;
}

export function sortedLocates(locates: readonly Locate[]): Locate[] {
  return [...locates].sort((a, b) => a.at - b.at);
}

/** Depth of the pipe at a footage: straight between marks, the nearest mark's depth past the ends. */
export function depthAt(marks: readonly Locate[], footage: number): number | null {
  if (marks.length === 0) return null;
  if (footage <= marks[0].at) return marks[0].depthFt;
  for (let i = 1; i < marks.length; i++) {
    const a = marks[i - 1];
    const b = marks[i];
    if (footage <= b.at) return a.depthFt + ((b.depthFt - a.depthFt) * (footage - a.at)) / (b.at - a.at);
  }
  return marks[marks.length - 1].depthFt;
}

/** practice: the ground between marks is taken to be what lies at the nearer mark. */
export function surfaceAt(marks: readonly Locate[], footage: number): Surface | null {
  let best: Locate | null = null;
  for (const m of marks) if (best === null || Math.abs(m.at - footage) < Math.abs(best.at - footage)) best = m;
  return best ? best.surface : null;
}

/**
 * derived: a sonde's field is a dipole; the two null points ahead of and behind it lie at
 * depth x sqrt(2) apart, so depth = spacing / sqrt(2). Locator manuals round this to 0.7.
 */
export const sondeDepthFromNulls = (nullSpacingFt: number): number => nullSpacingFt / Math.SQRT2;
