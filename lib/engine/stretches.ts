import { findingGroup, type FindingType } from "./finding-types";
import { segmentsOverlapping, sideAt } from "./geometry";
import { STOP_NEAR_FT } from "./rating";
import type { Finding, InspectionRecord, Locate } from "./record";
import { depthAt, sortedLocates, surfaceAt } from "./slope";
import { STOPPED_IN_LINE, type Material, type Side, type Surface } from "./vocabulary";

// practice: findings of grade 3 and worse need work; below that they are watched. A collapse
// always needs work.
export const WORK_GRADE = 3;
// practice: a repair reaches sound pipe on either side of the defect.
export const REPAIR_MARGIN_FT = 2;
// practice: two repairs this close are done as one job.
export const MERGE_GAP_FT = 5;
// practice: where no deformation was measured, a liner design assumes 2 % ovality.
export const ASSUMED_OVALITY_PCT = 2;

// practice: the costlier the surface to open, the later in this list; a stretch is priced by its worst.
const SURFACE_ORDER: readonly Surface[] = ["soil", "hardscape", "under_building", "street"];

export interface StretchFacts {
  from: number;
  to: number;
  length: number;
  side: Side;
  /** Every finding on the stretch, minor ones included: a minor sag still keeps a liner out. */
  findingIndices: number[];
  findings: Finding[];
  /** The findings that made this a stretch needing work. */
  workIndices: number[];
  materials: Material[];
  diameters: number[];
  depthFt: number | null;
  surface: Surface | null;
  ovalityPct: number;
  ovalityMeasured: boolean;
  /** The survey stopped inside or at the end of this stretch, at something in the pipe. */
  stoppedHere: boolean;
  stopAt: number;
}

export const needsWork = (f: Finding): boolean => f.grade >= WORK_GRADE || f.type === "collapse";
export const findingEnd = (f: Finding): number => f.to ?? f.at;

interface Span {
  from: number;
  to: number;
  side: Side;
  indices: number[];
}

function pieces(f: Finding, index: number, boundary: number | null, end: number): Span[] {
  const a = f.at;
  const b = findingEnd(f);
  const pad = (from: number, to: number, side: Side): Span => {
    const lo = side === "public" && boundary !== null ? boundary : 0;
    const hi = side === "private" && boundary !== null ? Math.min(boundary, end) : end;
    return { from: Math.max(lo, from - REPAIR_MARGIN_FT), to: Math.min(hi, to + REPAIR_MARGIN_FT), side, indices: [index] };
  };
  if (boundary === null || b < boundary) return [pad(a, b, "private")];
  if (a >= boundary) return [pad(a, b, "public")];
  return [pad(a, boundary, "private"), pad(boundary, b, "public")];
}

/** The stretches of line that need work: padded, merged when close, never across the boundary. */
export function workSpans(record: InspectionRecord): Span[] {
  const end = record.surveyEnd.at;
  const raw = record.findings.flatMap((f, i) => (needsWork(f) ? pieces(f, i, record.boundaryAt, end) : []));
  raw.sort((x, y) => x.from - y.from || x.to - y.to);
  const merged: Span[] = [];
  for (const span of raw) {
    const last = merged.find((m) => m.side === span.side && span.from <= m.to + MERGE_GAP_FT && span.to >= m.from - MERGE_GAP_FT);
    if (last) {
      last.from = Math.min(last.from, span.from);
      last.to = Math.max(last.to, span.to);
      for (const i of span.indices) if (!last.indices.includes(i)) last.indices.push(i);
    } else merged.push({ ...span, indices: [...span.indices] });
  }
  return merged.sort((x, y) => x.from - y.from);
}

function worstSurface(all: readonly Locate[], from: number, to: number, side: Side, boundary: number | null): Surface | null {
  // practice: the ground on the owner's side says nothing about the street past the boundary.
  const sameSide = all.filter((m) => sideAt(m.at, boundary) === side);
  const marks = sameSide.length > 0 ? sameSide : all;
  const seen = [surfaceAt(marks, from), surfaceAt(marks, to), ...marks.filter((m) => m.at > from && m.at < to).map((m) => m.surface)];
  let worst: Surface | null = null;
  for (const s of seen) if (s !== null && (worst === null || SURFACE_ORDER.indexOf(s) > SURFACE_ORDER.indexOf(worst))) worst = s;
  return worst;
}

function deepest(marks: readonly Locate[], from: number, to: number): number | null {
  const ends = [depthAt(marks, from), depthAt(marks, to)];
  if (ends[0] === null || ends[1] === null) return null;
  return Math.max(ends[0], ends[1], ...marks.filter((m) => m.at > from && m.at < to).map((m) => m.depthFt));
}

export function stretchFacts(record: InspectionRecord): StretchFacts[] {
  const marks = sortedLocates(record.locates);
  const { surveyEnd } = record;
  const stopped = STOPPED_IN_LINE.includes(surveyEnd.reason);
  return workSpans(record).map((span) => {
    const findingIndices: number[] = [];
    record.findings.forEach((f, i) => {
      if (f.at <= span.to && findingEnd(f) >= span.from) findingIndices.push(i);
    });
    const findings = findingIndices.map((i) => record.findings[i]);
    const segs = segmentsOverlapping(record.segments, span.from, span.to);
    const deformations = findings.filter((f) => f.type === "deformation" && f.lossPct !== null);
    return {
      from: span.from,
      to: span.to,
      length: span.to - span.from,
      side: span.side,
      findingIndices,
      findings,
      workIndices: span.indices.sort((a, b) => a - b),
      materials: [...new Set(segs.map((s) => s.material))],
      diameters: [...new Set(segs.map((s) => s.diameterIn))],
      depthFt: deepest(marks, span.from, span.to),
      surface: worstSurface(marks, span.from, span.to, span.side, record.boundaryAt),
      ovalityPct: deformations.length > 0 ? Math.max(...deformations.map((f) => f.lossPct ?? 0)) : ASSUMED_OVALITY_PCT,
      ovalityMeasured: deformations.length > 0,
      stoppedHere: stopped && span.to >= surveyEnd.at - STOP_NEAR_FT,
      stopAt: surveyEnd.at,
    };
  });
}

export const ofType = (facts: StretchFacts, ...types: FindingType[]): Finding[] => facts.findings.filter((f) => types.includes(f.type));
export const isStructural = (f: Finding): boolean => findingGroup(f.type) === "structural";
