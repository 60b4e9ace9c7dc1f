import type { InspectionRecord, MetricRecord } from "./record";
import { metresToFeet, mmToInches } from "./units";

// practice: metric pipe is sold by nominal sizes that stand for the inch sizes (DN 100 for 4 in,
// DN 200 for 8 in); a diameter within 4 % of an inch size is read as that size, so that DN 200
// meets the 8-in slope row rather than falling just short of it.
const NOMINAL_INCHES = [1.5, 2, 2.5, 3, 4, 5, 6, 8, 10, 12, 15, 18, 21, 24, 27, 30, 36, 42, 48, 54, 60, 72, 84, 96, 108];
const SNAP_TOLERANCE = 0.04;

export function nominalDiameterIn(mm: number): number {
  const inches = mmToInches(mm);
  let best = inches;
  let bestGap = Infinity;
  for (const n of NOMINAL_INCHES) {
    const gap = Math.abs(inches - n) / n;
    if (gap <= SNAP_TOLERANCE && gap < bestGap) {
      best = n;
      bestGap = gap;
    }
  }
  return best;
}

/** Metric in, feet and inches out: the only place the engine sees metres. */
export function metricToImperial(m: MetricRecord): InspectionRecord {
  const ft = metresToFeet;
  const ftOrNull = (v: number | null) => (v === null ? null : ft(v));
  return {
    access: m.access,
    segments: m.segments.map((s) => ({
      from: ft(s.from),
      to: ft(s.to),
      material: s.material,
      diameterIn: nominalDiameterIn(s.diameterMm),
    })),
    surveyEnd: { at: ft(m.surveyEnd.at), reason: m.surveyEnd.reason },
    boundaryAt: ftOrNull(m.boundaryAt),
    locates: m.locates.map((l) => ({
      at: ft(l.at),
      depthFt: ft(l.depthM),
      groundElevationFt: ftOrNull(l.groundElevationM),
      surface: l.surface,
    })),
    findings: m.findings.map((f) => ({ ...f, at: ft(f.at), to: ftOrNull(f.to) })),
  };
}
