import { FINDING_TYPES, LOSS_OF_AREA_TYPES, type FindingType } from "@/lib/engine/finding-types";
import {
  ACCESS_KINDS,
  MATERIALS,
  SURFACES,
  SURVEY_END_REASONS,
  type AccessKind,
  type Material,
  type Surface,
  type SurveyEndReason,
} from "@/lib/engine/vocabulary";

// What the editors hold: every number as the text typed, so a half-typed value is never lost.
export type SegmentForm = { from: string; to: string; material: Material | ""; diameterIn: string };
export type LocateForm = { at: string; depthFt: string; groundElevationFt: string; surface: Surface | ""; note: string };
export type FindingForm = {
  at: string;
  to: string;
  type: FindingType | "";
  grade: string;
  clock: string;
  lossPct: string;
  waterDepthPct: string;
  note: string;
  clipId: string;
  second: string;
  stillId: string;
};
export type WorkspaceForm = {
  access: { kind: AccessKind | ""; note: string; diameterIn: string };
  surveyEnd: { at: string; reason: SurveyEndReason | "" };
  segments: SegmentForm[];
  boundary: { known: "yes" | "unknown"; at: string };
  locates: LocateForm[];
  findings: FindingForm[];
  narrative: string;
  recommendation: string;
};

/** The record as saved in the draft and sent to the engine; extra keys (notes, clip links) ride along. */
export type DraftRecord = {
  access: { kind?: AccessKind; note?: string; diameterIn?: number | null };
  segments: { from?: number; to?: number; material?: Material; diameterIn?: number }[];
  surveyEnd: { at?: number; reason?: SurveyEndReason };
  boundaryAt: number | null;
  boundaryKnown: boolean;
  locates: { at?: number; depthFt?: number; groundElevationFt: number | null; surface?: Surface; note?: string }[];
  findings: {
    at?: number;
    to: number | null;
    type?: FindingType;
    grade?: number;
    clock: string | null;
    lossPct: number | null;
    waterDepthPct: number | null;
    note?: string;
    clipId?: string;
    /** The second in the clip where the finding shows (the buyer's report plays from it). */
    clipSecond?: number;
    stillId?: string;
  }[];
};

export const emptySegment = (from = ""): SegmentForm => ({ from, to: "", material: "", diameterIn: "" });
export const emptyLocate = (): LocateForm => ({ at: "", depthFt: "", groundElevationFt: "", surface: "", note: "" });
export const emptyFinding = (): FindingForm => ({
  at: "",
  to: "",
  type: "",
  grade: "",
  clock: "",
  lossPct: "",
  waterDepthPct: "",
  note: "",
  clipId: "",
  second: "",
  stillId: "",
});

/** Which extra share the type records: the cross-section lost, the diameter lost (deformation), standing water (sag). */
export function shareKind(type: FindingType | ""): "area" | "diameter" | "water" | null {
  if (type === "") return null;
  if (type === "sag") return "water";
  if (type === "deformation") return "diameter";
  return LOSS_OF_AREA_TYPES.includes(type) ? "area" : null;
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);
const list = (v: unknown): Record<string, unknown>[] => (Array.isArray(v) ? v.filter(isObject) : []);
const text = (v: unknown): string => (typeof v === "number" && Number.isFinite(v) ? String(v) : typeof v === "string" ? v : "");
const oneOf = <T extends string>(values: readonly T[], v: unknown): T | "" => (values.includes(v as T) ? (v as T) : "");

/** A saved draft (possibly partial or from an older shape) back into editor values. */
export function fromRecord(raw: unknown, narrative = "", recommendation = ""): WorkspaceForm {
  const r = isObject(raw) ? raw : {};
  const access = isObject(r.access) ? r.access : {};
  const end = isObject(r.surveyEnd) ? r.surveyEnd : {};
  const boundaryAt = r.boundaryAt;
  const known = (typeof boundaryAt === "number" && Number.isFinite(boundaryAt)) || r.boundaryKnown === true;
  return {
    access: { kind: oneOf(ACCESS_KINDS, access.kind), note: text(access.note), diameterIn: text(access.diameterIn) },
    surveyEnd: { at: text(end.at), reason: oneOf(SURVEY_END_REASONS, end.reason) },
    segments: list(r.segments).map((s) => ({
      from: text(s.from),
      to: text(s.to),
      material: oneOf(MATERIALS, s.material),
      diameterIn: text(s.diameterIn),
    })),
    boundary: { known: known ? "yes" : "unknown", at: text(boundaryAt) },
    locates: list(r.locates).map((l) => ({
      at: text(l.at),
      depthFt: text(l.depthFt),
      groundElevationFt: text(l.groundElevationFt),
      surface: oneOf(SURFACES, l.surface),
      note: text(l.note),
    })),
    findings: list(r.findings).map((f) => ({
      at: text(f.at),
      to: text(f.to),
      type: oneOf(Object.keys(FINDING_TYPES) as FindingType[], f.type),
      grade: text(f.grade),
      clock: text(f.clock),
      lossPct: text(f.lossPct),
      waterDepthPct: text(f.waterDepthPct),
      note: text(f.note),
      clipId: text(f.clipId),
      second: text(f.clipSecond ?? f.second),
      stillId: text(f.stillId),
    })),
    narrative,
    recommendation,
  };
}

/** "12.5" (or "12,5") to 12.5; blank or not a number to undefined. */
export function parseNumber(s: string): number | undefined {
  const t = s.trim().replace(",", ".");
  if (t === "") return undefined;
  const n = Number(t);
  return Number.isFinite(n) ? n : undefined;
}

const num = parseNumber;
const numOrNull = (s: string): number | null => num(s) ?? null;
const optionalText = (s: string): string | undefined => (s.trim() === "" ? undefined : s);

/**
 * Editor values to the record. Segments after the first start where the previous one ends, so
 * the profile tiles by construction; shares a type does not record are dropped.
 */
export function toRecord(form: WorkspaceForm): DraftRecord {
  const segments = form.segments.map((s, i) => ({
    from: i === 0 ? 0 : num(form.segments[i - 1].to),
    to: num(s.to),
    material: s.material || undefined,
    diameterIn: num(s.diameterIn),
  }));
  return {
    access: { kind: form.access.kind || undefined, note: optionalText(form.access.note), diameterIn: numOrNull(form.access.diameterIn) },
    segments,
    surveyEnd: { at: num(form.surveyEnd.at), reason: form.surveyEnd.reason || undefined },
    boundaryAt: form.boundary.known === "yes" ? numOrNull(form.boundary.at) : null,
    boundaryKnown: form.boundary.known === "yes",
    locates: form.locates.map((l) => ({
      at: num(l.at),
      depthFt: num(l.depthFt),
      groundElevationFt: numOrNull(l.groundElevationFt),
      surface: l.surface || undefined,
      note: optionalText(l.note),
    })),
    findings: form.findings.map((f) => {
      const share = shareKind(f.type);
      return {
        at: num(f.at),
        to: numOrNull(f.to),
        type: f.type || undefined,
        grade: num(f.grade),
        clock: f.clock.trim() === "" ? null : f.clock.trim(),
        lossPct: share === "area" || share === "diameter" ? numOrNull(f.lossPct) : null,
        waterDepthPct: share === "water" ? numOrNull(f.waterDepthPct) : null,
        note: optionalText(f.note),
        clipId: optionalText(f.clipId),
        clipSecond: f.clipId.trim() === "" ? undefined : num(f.second),
        stillId: optionalText(f.stillId),
      };
    }),
  };
}

/** Problems the engine cannot see because the draft keeps them out of the record. */
export function localProblems(form: WorkspaceForm): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  if (form.boundary.known === "yes" && num(form.boundary.at) === undefined) {
    out.boundaryAt = ["Enter the footage where the public side begins, or choose Unknown."];
  }
  return out;
}
