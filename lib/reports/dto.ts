import type { Evaluation } from "@/lib/engine";

/** What anyone entitled to see a report's existence may see: never findings, ratings, costs or clip URLs. */
export type ReportPreview = {
  id: string;
  locked: true;
  address: { street: string; unit: string | null; city: string; state: string; postalCode: string };
  /** The day of the visit in the listing's own time zone (an ISO date), whatever zone the reader is in. */
  visitedOn: string | null;
  deliveredAt: string | null;
  /** The listing's IANA time zone, for the timestamps above. */
  timeZone: string;
  inspector: { name: string; company: string | null; licenceNumber: string | null } | null;
  clipCount: number;
  surveyedFt: number | null;
  priceCents: number;
  unlockIncludes: string[];
  /** The buyer's latest checkout: lets the page say "payment declined" or "confirming payment". */
  payment: { status: "pending" | "paid" | "expired" | "refunded" | "partially_refunded"; createdAt: string } | null;
};

export type ReportClip = { id: string; label: string; durationSeconds: number | null; startFootage: number | null; playbackUrl: string; posterUrl: string | null };

/** The raw record as the inspector saved it: the engine's fields plus clip, still and note references. */
export type ReportRecord = {
  access?: { kind?: string; note?: string; diameterIn?: number };
  segments?: { from: number; to: number; material: string; diameterIn: number }[];
  surveyEnd?: { at: number; reason: string };
  boundaryAt?: number | null;
  locates?: { at: number; depthFt: number; groundElevationFt?: number | null; surface: string; note?: string }[];
  findings?: { at: number; to?: number | null; type: string; grade: number; clock?: string | null; lossPct?: number | null; waterDepthPct?: number | null; note?: string; clipId?: string; clipSecond?: number; stillId?: string }[];
};

export type ReportSummary = Omit<ReportPreview, "locked"> & {
  locked: false;
  record: ReportRecord;
  evaluation: Evaluation;
  narrative: string;
  recommendation: string;
  clips: ReportClip[];
  stills: Record<string, string>;
  engineVersion: string;
  observedOn: string | null;
};

export type ReportView = ReportPreview | ReportSummary;

export const UNLOCK_INCLUDES = [
  "The severity rating from 1 (sound) to 5 (critical), with what it means for this house",
  "A side view of the line with every finding at its footage",
  "The inspector's clips, each finding playing from its second",
  "Repair options that fit each stretch, with cost ranges split between your side and the city's",
  "A PDF to share with your agent or a contractor",
];
