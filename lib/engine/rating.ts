import { aggregate, type Bands, type ScoredItem } from "./aggregate";
import { findingGroup } from "./finding-types";
import { describeFinding, ftText } from "./format";
import type { Finding, InspectionRecord } from "./record";
import { SEVERITY_METHOD_ID } from "./version";
import { STOPPED_IN_LINE, SURVEY_END_LABELS } from "./vocabulary";

export type Severity = 1 | 2 | 3 | 4 | 5;
export const SEVERITY_LABELS = { 1: "Sound", 2: "Minor", 3: "Moderate", 4: "Serious", 5: "Critical" } as const;
export type SeverityLabel = (typeof SEVERITY_LABELS)[Severity];

// Gradeline severity method v1 (own method, see lib/engine/README.md). Every constant below is a
// choice of this method, not a published figure.
/** Points per finding by its grade; roughly doubling so one bad defect outweighs several small ones. */
export const POINTS_BY_GRADE = [0, 1, 3, 8, 20, 40] as const;
/** Peak bands on points: they give back the finding's own grade. */
const PEAK_BANDS: Bands = [1, 3, 8, 20];
/** Density bands on points per 100 ft: up to 5 grade 1, 15 grade 2, 40 grade 3, 80 grade 4, above grade 5. */
export const DENSITY_BANDS: Bands = [5, 15, 40, 80];
/** The mean is never taken over less than this, so one defect in a short run does not read as a dense line. */
export const MIN_DENSITY_LENGTH_FT = 50;
/** A continuous defect scores once for every started 5 ft it runs. */
export const CONTINUOUS_STEP_FT = 5;
/** Density can lift the rating at most this many steps above the worst single finding ... */
const DENSITY_LIFT = 1;
/** ... and never to Critical: that takes a failed pipe, not many faults. */
const DENSITY_CEILING = 4;
/** A finding reaching this close to where the camera stopped is the reason it stopped. */
export const STOP_NEAR_FT = 3;

export interface Density {
  points: number;
  perHundredFt: number;
  /** The length the mean was taken over: the surveyed length, or MIN_DENSITY_LENGTH_FT if longer. */
  overFt: number;
  grade: number;
}

export interface Rating {
  method: typeof SEVERITY_METHOD_ID;
  /** Worst grade among structural findings; 0 when there are none. */
  structuralGrade: number;
  /** Worst grade among service findings; 0 when there are none. */
  serviceGrade: number;
  density: Density;
  severity: Severity;
  severityLabel: SeverityLabel;
  /** Why the rating is what it is, in plain words, most important first. */
  reasons: string[];
}

const ft = ftText;
const describe = describeFinding;

export function scoredItems(findings: readonly Finding[]): ScoredItem[] {
  const items: ScoredItem[] = [];
  for (const f of findings) {
    const score = POINTS_BY_GRADE[f.grade];
    const steps = f.to === null ? 1 : Math.max(1, Math.ceil((f.to - f.at) / CONTINUOUS_STEP_FT));
    for (let k = 0; k < steps; k++) items.push({ at: f.at + k * CONTINUOUS_STEP_FT, score });
  }
  return items;
}

const clampSeverity = (n: number): Severity => Math.min(5, Math.max(1, Math.round(n))) as Severity;

export function rate(record: InspectionRecord): Rating {
  const { findings, surveyEnd } = record;
  let structuralGrade = 0;
  let serviceGrade = 0;
  let worst: Finding | null = null;
  for (const f of findings) {
    if (findingGroup(f.type) === "structural") structuralGrade = Math.max(structuralGrade, f.grade);
    else serviceGrade = Math.max(serviceGrade, f.grade);
    if (worst === null || f.grade > worst.grade) worst = f;
  }

  const overFt = Math.max(surveyEnd.at, MIN_DENSITY_LENGTH_FT);
  const agg = aggregate({ items: scoredItems(findings), length: overFt, meanPer: 100, peakBands: PEAK_BANDS, meanBands: DENSITY_BANDS });
  const peak = agg.peakGrade;
  const lifted = Math.min(agg.meanGrade, peak + DENSITY_LIFT, DENSITY_CEILING);
  let severity = Math.max(peak, lifted);
  const reasons: string[] = [];
  const named = new Set<Finding>();
  let unseen = false;
  if (STOPPED_IN_LINE.includes(surveyEnd.reason)) {
    const stopper = findings.find((f) => f.grade >= 3 && (f.to ?? f.at) >= surveyEnd.at - STOP_NEAR_FT);
    if (stopper) {
      severity = 5;
      named.add(stopper);
      reasons.push(`${SURVEY_END_LABELS[surveyEnd.reason]} at ${ft(surveyEnd.at)}, at the ${describe(stopper)}`);
    } else {
      // practice: an unseen remainder is never rated better than Moderate.
      severity = Math.max(severity, 3);
      unseen = true;
    }
  }
  const collapse = findings.find((f) => f.type === "collapse");
  if (collapse) {
    severity = 5;
    if (!named.has(collapse)) reasons.push(`the pipe has collapsed at ${ft(collapse.at)}`);
    named.add(collapse);
  }
  if (worst && !named.has(worst)) reasons.push(`the worst finding is the ${describe(worst)}`);
  if (!worst) reasons.push("no defects were recorded");
  if (lifted > peak) reasons.push(`there are many defects for the length of line (${Math.round(agg.mean)} points per 100 ft)`);
  if (unseen) {
    reasons.push(`${SURVEY_END_LABELS[surveyEnd.reason]} at ${ft(surveyEnd.at)}: the rest of the line was not seen`);
  }
  const s = clampSeverity(severity);
  return {
    method: SEVERITY_METHOD_ID,
    structuralGrade,
    serviceGrade,
    density: { points: agg.total, perHundredFt: agg.mean, overFt, grade: agg.meanGrade },
    severity: s,
    severityLabel: SEVERITY_LABELS[s],
    reasons,
  };
}
