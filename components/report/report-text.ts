import { formatMoney } from "@/components/ui/money";
import type { Evaluation, Side } from "@/lib/engine";
import { formatDate } from "@/lib/format";
import type { ReportClip, ReportSummary } from "@/lib/reports/dto";

// Wording shared by the rated summary page, the share page and the PDF, so all three say the same.

/** Footage to a tenth of a foot, the counter's resolution: 44, 17.5. */
export const ftNumber = (v: number): string => String(Math.round(v * 10) / 10);
export const ftText = (v: number): string => `${ftNumber(v)} ft`;
export const ftSpan = (from: number, to: number | null): string =>
  to !== null && to > from ? `${ftNumber(from)}–${ftNumber(to)} ft` : ftText(from);

export const SIDE_TEXT: Record<Side, string> = { private: "Owner's side (private)", public: "City's side (public)" };
export const SIDE_SHORT: Record<Side, string> = { private: "owner's side", public: "city's side" };

export function clockText(clock: string | null | undefined): string | null {
  if (!clock) return null;
  const [a, b] = clock.split("-").map((s) => s.trim());
  return b ? `${a} to ${b} o'clock` : `${a} o'clock`;
}

/** Seconds into a clip as m:ss: "0:42". */
export function clipTime(second: number): string {
  const s = Math.max(0, Math.floor(second));
  return `${Math.floor(s / 60)}:${String(s % 60).padStart(2, "0")}`;
}

export const rangeText = (r: { lowCents: number; highCents: number }): string =>
  `${formatMoney(r.lowCents, { whole: true })}–${formatMoney(r.highCents, { whole: true })}`;

/** An ISO date is a calendar day and reads as itself; a timestamp reads on its day in `timeZone` (the listing's). */
export function dateText(value: string | null | undefined, timeZone = "UTC"): string | null {
  if (!value) return null;
  const dayOnly = /^\d{4}-\d{2}-\d{2}$/.test(value);
  const d = new Date(dayOnly ? `${value}T12:00:00Z` : value);
  return Number.isNaN(d.getTime()) ? null : formatDate(d, dayOnly ? "UTC" : timeZone);
}

export function observedLine(s: Pick<ReportSummary, "observedOn" | "visitedOn">): string {
  const day = dateText(s.observedOn ?? s.visitedOn);
  return day ? `As observed on ${day}` : "As observed on the day of the visit";
}

export const DISCLAIMER = [
  "The camera shows only what it saw inside the line on the day of the visit. This summary is not a warranty or a guarantee of the line's condition, then or later.",
  "Footages and depths are approximate. Cost ranges are estimates for negotiation, not quotes: get written bids before relying on a figure.",
  "Local codes, the city and a licensed contractor decide which repair is allowed and needed.",
] as const;

/** One sentence: what the rating means for this house, in the buyer's terms. */
export function severityMeaning(e: Evaluation): string {
  const own = e.stretches.some((s) => s.side === "private");
  const city = e.stretches.some((s) => s.side === "public");
  const cost = `the owner's share of the suggested repairs is estimated at ${rangeText(e.costBySide.private)}, a figure to negotiate with rather than a quote`;
  switch (e.severity) {
    case 1:
      return "For this house, the camera saw nothing in the line that needs work, so the line itself gives no reason to ask for a repair or a credit.";
    case 2:
      return "For this house, the faults seen are small and need no repair now; they are worth watching, and a fresh scope in a few years would show whether they grow.";
    case 3:
      if (own) return `For this house, parts of the line need attention but have not failed; ${cost}.`;
      if (city)
        return "For this house, the work found is on the city's side of the line, which the city or utility decides; the owner's side needs no repair now.";
      return "For this house, the line was not seen to its end, so ask for the rest of it to be scoped before relying on it.";
    case 4:
      if (own) return `For this house, the line has damage that needs repair; ${cost}.`;
      return "For this house, the damage that needs repair is on the city's side of the line; report it to the city or utility, which decides the repair.";
    case 5:
      if (own) return `For this house, the line has failed or is close to failing and needs repair before anyone relies on it; ${cost}.`;
      return "For this house, the line has failed or may be failing and needs a repair or a further look before anyone relies on it; report any part on the city's side to the city or utility.";
  }
}

export function methodLines(s: ReportSummary): string[] {
  const e = s.evaluation;
  return [
    `Severity rating by ${e.severityMethod}, Gradeline's own method: the worse of the worst finding's grade and a per-length figure for how dense the defects are (${e.density.perHundredFt.toFixed(1)} points per 100 ft here). It is not a published method; other methods grade the same pipe differently.`,
    `Rating and repair engine version ${s.engineVersion}.`,
    `Slope minimums: ${e.slopeRules.name} (${e.slopeRules.source}). Grades between locate marks are estimates.`,
    `Cost rates: ${e.rates.name}, effective ${e.rates.effectiveDate}${e.rates.demo ? " (invented demo values)" : ""}.`,
  ];
}

export type ReportFinding = {
  index: number;
  label: string;
  grade: number;
  at: number;
  to: number | null;
  side: Side;
  clock: string | null;
  note: string | null;
  /** Loss of cross-section, or standing water, in plain words. */
  measure: string | null;
  clip: ReportClip | null;
  clipSecond: number;
  stillUrl: string | null;
};

function measureText(type: string, lossPct: number | null | undefined, waterDepthPct: number | null | undefined): string | null {
  if (type === "sag" && waterDepthPct != null) return `Standing water ${Math.round(waterDepthPct)} % of the pipe's height`;
  if (lossPct == null) return null;
  if (type === "deformation") return `Diameter reduced by ${Math.round(lossPct)} %`;
  return `About ${Math.round(lossPct)} % of the cross-section lost`;
}

/** The engine's findings joined with the inspector's notes, clips and stills; worst grade first, then by footage. */
export function findingsWorstFirst(s: ReportSummary): ReportFinding[] {
  const clips = new Map(s.clips.map((c) => [c.id, c]));
  const raw = s.record.findings ?? [];
  return s.evaluation.findings
    .map((f) => {
      const r = raw[f.index];
      return {
        index: f.index,
        label: f.label,
        grade: f.grade,
        at: f.at,
        to: f.to,
        side: f.side,
        clock: f.clock,
        note: r?.note?.trim() || null,
        measure: measureText(f.type, r?.lossPct, r?.waterDepthPct),
        clip: r?.clipId ? (clips.get(r.clipId) ?? null) : null,
        clipSecond: r?.clipSecond ?? 0,
        stillUrl: r?.stillId ? (s.stills[r.stillId] ?? null) : null,
      };
    })
    .sort((a, b) => b.grade - a.grade || a.at - b.at);
}

/** "gradeline-report-42-sluice-gate-way.pdf" */
export function pdfFileName(street: string): string {
  const slug = street
    .normalize("NFKD")
    .replace(/[^\w\s-]/g, "")
    .trim()
    .toLowerCase()
    .replace(/[\s_-]+/g, "-")
    .slice(0, 60);
  return `gradeline-report-${slug || "summary"}.pdf`;
}
