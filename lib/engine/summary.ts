import { FINDING_TYPES, type FindingType } from "./finding-types";
import { ftRange, ftText, inText, pctText, rangeText, sizeText } from "./format";
import type { Lengths } from "./geometry";
import { sideAt } from "./geometry";
import type { Rating } from "./rating";
import type { InspectionRecord } from "./record";
import type { CostBySide, Stretch } from "./repair";
import type { SagReading } from "./sags";
import type { GradeBetweenMarks } from "./slope";
import type { SlopeRuleSet } from "./slope-rules";
import { ACCESS_LABELS, MATERIAL_LABELS, SURVEY_END_PHRASES, type Side } from "./vocabulary";

export interface SummaryInput {
  record: InspectionRecord;
  lengths: Lengths;
  rating: Rating;
  grades: readonly GradeBetweenMarks[];
  sags: readonly SagReading[];
  stretches: readonly Stretch[];
  costs: CostBySide;
  slopeRules: SlopeRuleSet;
}

const sideText = (side: Side) => `${side} side`;
const cap = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

function findingBullets(record: InspectionRecord): string[] {
  const groups = new Map<string, { type: FindingType; side: Side; from: number; to: number; count: number; worst: number }>();
  for (const f of record.findings) {
    if (f.type === "sag") continue;
    const side = sideAt(f.at, record.boundaryAt);
    const key = `${f.type}:${side}`;
    const g = groups.get(key) ?? { type: f.type, side, from: f.at, to: f.to ?? f.at, count: 0, worst: 0 };
    g.from = Math.min(g.from, f.at);
    g.to = Math.max(g.to, f.to ?? f.at);
    g.count++;
    g.worst = Math.max(g.worst, f.grade);
    groups.set(key, g);
  }
  return [...groups.values()]
    .sort((a, b) => a.from - b.from)
    .map((g) => {
      const info = FINDING_TYPES[g.type];
      const what = g.count === 1 ? info.label : `${g.count} ${info.plural}`;
      const where = g.to > g.from ? `from ${ftText(g.from)} to ${ftText(g.to)}` : `at ${ftText(g.from)}`;
      return `${what} ${where} (${sideText(g.side)}), ${g.count === 1 ? "grade" : "worst grade"} ${g.worst} of 5.`;
    });
}

function materialBullet(lengths: Lengths): string {
  if (lengths.segments.length <= 4) {
    const parts = lengths.segments.map((s) => `${MATERIAL_LABELS[s.material]} ${ftRange(s.from, s.to)} (${inText(s.diameterIn)})`);
    return `Pipe: ${parts.join(", ")}.`;
  }
  return `Pipe: ${lengths.byMaterial.map((m) => `${m.label} ${ftText(m.length)}`).join(", ")} in ${lengths.segments.length} pieces.`;
}

/** Plain-language bullets a buyer can read beside the inspector's own narrative. */
export function summaryBullets({ record, lengths, rating, grades, sags, stretches, costs, slopeRules }: SummaryInput): string[] {
  const out: string[] = [];
  out.push(`Severity ${rating.severity} of 5, ${rating.severityLabel}: ${rating.reasons.slice(0, 2).join("; ")}.`);
  const end = record.surveyEnd;
  out.push(`The camera went ${ftText(lengths.surveyed)} from ${ACCESS_LABELS[record.access.kind]} ${SURVEY_END_PHRASES[end.reason]}.`);
  if (lengths.boundaryAt === null)
    out.push(`All ${ftText(lengths.surveyed)} are counted as the owner's (private side): where the city's part begins was not found.`);
  else if (lengths.boundaryBeyondSurvey)
    out.push(
      `All ${ftText(lengths.surveyed)} seen are the owner's (private side); the city's part begins at ${ftText(lengths.boundaryAt)}.`,
    );
  else
    out.push(
      `The first ${ftText(lengths.private)} are the owner's (private side); the last ${ftText(lengths.public)}, from ${ftText(lengths.boundaryAt)}, are the city's or utility's (public side).`,
    );
  out.push(materialBullet(lengths));
  out.push(...findingBullets(record));
  for (const s of sags) {
    const where = s.to !== null && s.to > s.at ? `from ${ftText(s.at)} to ${ftText(s.to)}` : `at ${ftText(s.at)}`;
    out.push(
      `A sag ${where} (${sideText(s.side)}) holds water ${pctText(s.waterDepthPct)} of the pipe's height, filling about ${pctText(s.areaFilledPct)} of its cross-section.`,
    );
  }
  for (const g of grades.filter((x) => !x.meetsMinimum)) {
    const how =
      g.slopeFtPerFt < 0
        ? "runs uphill toward the main"
        : `falls about ${Math.round(g.inPerFt * 100) / 100} in per ft, less than the ${g.minimumText} the ${slopeRules.name} asks of ${sizeText(g.diameterIn)} pipe`;
    out.push(
      `Between the marks at ${ftText(g.from)} and ${ftText(g.to)} (${sideText(g.side)}) the line ${how} (an estimate from locator depths).`,
    );
  }
  if (grades.length > 0 && grades.every((g) => g.meetsMinimum))
    out.push(`Estimated grades between locate marks meet the ${slopeRules.name} minimum everywhere they were measured.`);
  if (stretches.length === 0) {
    out.push(
      record.findings.length > 0 ? "No stretch needs repair now; the minor findings are worth watching." : "No defects were recorded.",
    );
    return out;
  }
  for (const s of stretches) {
    const pick = s.options.find((o) => o.method === s.suggested);
    const priced =
      pick && pick.costLowCents !== null && pick.costHighCents !== null
        ? `${pick.label}, about ${rangeText(pick.costLowCents, pick.costHighCents)}`
        : "see the repair options";
    const out0 = s.options.filter((o) => !o.fits && o.method !== "no_action").map((o) => o.label.toLowerCase());
    const ruled = out0.length > 0 ? ` Ruled out here: ${out0.join(", ")}.` : "";
    out.push(`${cap(ftRange(s.from, s.to))} (${sideText(s.side)}) needs work: ${s.why}. Suggested: ${priced}.${ruled}`);
  }
  const money = (side: Side) => rangeText(costs[side].lowCents, costs[side].highCents);
  const sides = (["private", "public"] as const).filter((side) => stretches.some((s) => s.side === side));
  out.push(
    cap(
      sides
        .map((side) => `${sideText(side)} estimate ${money(side)}${side === "public" ? " (the city's or utility's to decide)" : ""}`)
        .join("; "),
    ) + ".",
  );
  return out;
}
