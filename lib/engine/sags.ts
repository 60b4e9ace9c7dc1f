import { segmentAt, sideAt } from "./geometry";
import { areaFilledPct } from "./pipe-section";
import type { InspectionRecord } from "./record";
import type { Side } from "./vocabulary";

export interface SagReading {
  /** Index into the record's findings. */
  finding: number;
  at: number;
  to: number | null;
  side: Side;
  diameterIn: number;
  grade: number;
  /** Depth of standing water as a share of the diameter, percent. */
  waterDepthPct: number;
  /** Share of the cross-section the water fills, percent (circular segment, derived). */
  areaFilledPct: number;
}

export function sagReadings(record: InspectionRecord): SagReading[] {
  const out: SagReading[] = [];
  record.findings.forEach((f, i) => {
    if (f.type !== "sag") return;
    const water = f.waterDepthPct ?? 0;
    out.push({
      finding: i,
      at: f.at,
      to: f.to,
      side: sideAt(f.at, record.boundaryAt),
      diameterIn: segmentAt(record.segments, f.at).diameterIn,
      grade: f.grade,
      waterDepthPct: water,
      areaFilledPct: areaFilledPct(water),
    });
  });
  return out;
}
