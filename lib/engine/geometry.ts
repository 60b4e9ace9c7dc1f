import type { InspectionRecord, Segment } from "./record";
import { MATERIAL_LABELS, type Material, type Side } from "./vocabulary";

/** All lengths in feet of counter footage. */
export interface MaterialLength {
  material: Material;
  label: string;
  length: number;
  private: number;
  public: number;
}

export interface SegmentLength {
  index: number;
  from: number;
  to: number;
  lengthFt: number;
  material: Material;
  diameterIn: number;
}

/** All lengths in feet of counter footage; private + public = surveyed. */
export interface Lengths {
  surveyed: number;
  private: number;
  public: number;
  /** Where the public side begins; null when the inspector could not tell. */
  boundaryAt: number | null;
  /** True when the boundary is known but lies past the end of the survey. */
  boundaryBeyondSurvey: boolean;
  byMaterial: MaterialLength[];
  segments: SegmentLength[];
}

/** Private is everything before the boundary; with no boundary recorded, all of it is private. */
export function sideAt(footage: number, boundaryAt: number | null): Side {
  return boundaryAt !== null && footage >= boundaryAt ? "public" : "private";
}

/** Feet of [from, to] that lie on the private side. */
export function privatePart(from: number, to: number, boundaryAt: number | null): number {
  if (boundaryAt === null) return to - from;
  return Math.max(0, Math.min(to, boundaryAt) - from);
}

export function segmentAt(segments: readonly Segment[], footage: number): Segment {
  for (const s of segments) if (footage < s.to) return s;
  return segments[segments.length - 1];
}

export function segmentsOverlapping(segments: readonly Segment[], from: number, to: number): Segment[] {
  const out = segments.filter((s) => s.from < to && s.to > from);
  return out.length > 0 ? out : [segmentAt(segments, from)];
}

export function lineLengths(record: InspectionRecord): Lengths {
  const surveyedFt = record.surveyEnd.at;
  const boundaryAt = record.boundaryAt;
  const privateFt = privatePart(0, surveyedFt, boundaryAt);
  const byMaterial = new Map<Material, MaterialLength>();
  const segments: SegmentLength[] = record.segments.map((s, index) => {
    const lengthFt = s.to - s.from;
    const priv = privatePart(s.from, s.to, boundaryAt);
    const entry = byMaterial.get(s.material) ?? {
      material: s.material,
      label: MATERIAL_LABELS[s.material],
      length: 0,
      private: 0,
      public: 0,
    };
    entry.length += lengthFt;
    entry.private += priv;
    entry.public += lengthFt - priv;
    byMaterial.set(s.material, entry);
    return { index, from: s.from, to: s.to, lengthFt, material: s.material, diameterIn: s.diameterIn };
  });
  return {
    surveyed: surveyedFt,
    private: privateFt,
    public: surveyedFt - privateFt,
    boundaryAt,
    boundaryBeyondSurvey: boundaryAt !== null && boundaryAt >= surveyedFt,
    byMaterial: [...byMaterial.values()],
    segments,
  };
}
