import type { Basis } from "./basis";
import { ftRange, ftText, listText } from "./format";
import type { Lengths } from "./geometry";
import type { RateTable } from "./rates";
import type { InspectionRecord } from "./record";
import type { Stretch } from "./repair";
import { LADDER_DEPTH_FT, PROTECTIVE_SYSTEM_DEPTH_FT } from "./safety";
import type { GradeBetweenMarks } from "./slope";
import { SURVEY_END_LABELS } from "./vocabulary";

export type CautionId =
  | "not-a-warranty"
  | "approximate-readings"
  | "level-ground-assumed"
  | "line-not-seen-beyond"
  | "public-side"
  | "boundary-unknown"
  | "estimates-not-quotes"
  | "depth-not-located"
  | "call-before-you-dig"
  | "trench-protective-system"
  | "trench-ladder"
  | "confined-space"
  | "bituminous-fibre";

export interface Caution {
  id: CautionId;
  level: "info" | "warning";
  text: string;
  basis: Basis;
  source: string | null;
  /** The footage it is about, when it is about one place. */
  at: number | null;
}

const DIGS = ["spot_repair", "excavate_replace", "pipe_bursting"] as const;
const span = (s: Stretch) => ftRange(s.from, s.to);

export interface CautionInput {
  record: InspectionRecord;
  lengths: Lengths;
  grades: readonly GradeBetweenMarks[];
  stretches: readonly Stretch[];
  rates: RateTable;
}

export function cautions({ record, lengths, grades, stretches, rates }: CautionInput): Caution[] {
  const out: Caution[] = [];
  const add = (c: Omit<Caution, "at"> & { at?: number | null }) => out.push({ ...c, at: c.at ?? null });
  const end = record.surveyEnd;

  add({
    id: "not-a-warranty",
    level: "info",
    basis: "practice",
    source: null,
    text: "A camera inspection shows only what the camera saw on the day of the inspection. It is not a warranty of the line.",
  });
  add({
    id: "approximate-readings",
    level: "info",
    basis: "practice",
    source: null,
    text: "Footages and depths are approximate: the counter measures cable, which reads long around bends, and a locator's depth is good to about 10 % or 2 in. Grades worked out from them are estimates.",
  });
  if (grades.some((g) => g.assumedLevelGround)) {
    add({
      id: "level-ground-assumed",
      level: "info",
      basis: "derived",
      source: null,
      text: "Where the ground elevation at a locate mark was not given, the ground was taken as level; on sloping ground the real grade differs.",
    });
  }
  if (end.reason !== "reached_main") {
    add({
      id: "line-not-seen-beyond",
      level: "warning",
      basis: "practice",
      source: null,
      at: end.at,
      text: `The survey stopped at ${ftText(end.at)} (${SURVEY_END_LABELS[end.reason]}). The line beyond was not seen and is not rated.`,
    });
  }
  if (lengths.boundaryAt === null) {
    add({
      id: "boundary-unknown",
      level: "info",
      basis: "practice",
      source: null,
      text: "Where the owner's part of the line ends and the city's begins was not found. Ask the city or utility; it may be at the property line, the curb or the main.",
    });
  } else if (!lengths.boundaryBeyondSurvey) {
    const publicWork = stretches.filter((s) => s.side === "public");
    const tail = publicWork.length > 0 ? ` Work found there (${listText(publicWork.map(span))}) should be reported to them.` : "";
    add({
      id: "public-side",
      level: publicWork.length > 0 ? "warning" : "info",
      basis: "practice",
      source: null,
      at: lengths.boundaryAt,
      text: `From ${ftText(lengths.boundaryAt)} on, the line is public: it belongs to the city or utility, not the owner.${tail}`,
    });
  }
  if (record.segments.some((s) => s.material === "bituminous_fibre")) {
    add({
      id: "bituminous-fibre",
      level: "info",
      basis: "practice",
      source: null,
      text: "Bituminous fibre pipe lasts about 50 years and often less; expect it to deform with age even where it looks sound today.",
    });
  }
  if (stretches.length === 0) return out;

  add({
    id: "estimates-not-quotes",
    level: "info",
    basis: "practice",
    source: rates.source,
    text: `Cost ranges are estimates for negotiation, not quotes (rates "${rates.name}", ${rates.effectiveDate}). Local codes and a licensed contractor decide the repair.`,
  });
  if (stretches.some((s) => s.depthAssumed)) {
    add({
      id: "depth-not-located",
      level: "info",
      basis: "practice",
      source: null,
      text: `No locate mark gave the depth of some stretches; their prices assume ${ftText(rates.assumedDepthFt)} deep.`,
    });
  }
  const digs = stretches.filter((s) => s.options.some((o) => o.fits && (DIGS as readonly string[]).includes(o.method)));
  if (digs.length === 0) return out;
  add({
    id: "call-before-you-dig",
    level: "warning",
    basis: "published",
    source: "811, the US call-before-you-dig number; APWA uniform colour code",
    text: "Before anyone digs, call 811 two to three working days ahead (state rules vary) so buried utilities are marked: proposed digs in white, sewer lines in green.",
  });
  const deep = digs.filter((s) => s.depthFt >= PROTECTIVE_SYSTEM_DEPTH_FT);
  if (deep.length > 0) {
    add({
      id: "trench-protective-system",
      level: "warning",
      basis: "published",
      source: "OSHA 29 CFR 1926.652(a)(1)",
      at: deep[0].from,
      text: `Digging at ${listText(deep.map((s) => `${span(s)} (about ${ftText(s.depthFt)} deep)`))} goes 5 ft or deeper: the trench needs a protective system (sloping, shoring or a shield) unless it is in stable rock.`,
    });
  }
  const ladder = digs.filter((s) => s.depthFt >= LADDER_DEPTH_FT);
  if (ladder.length > 0) {
    add({
      id: "trench-ladder",
      level: "info",
      basis: "published",
      source: "OSHA 29 CFR 1926.651(c)(2)",
      at: ladder[0].from,
      text: "A trench 4 ft or deeper needs a ladder or ramp within 25 ft of travel.",
    });
  }
  add({
    id: "confined-space",
    level: "info",
    basis: "published",
    source: "29 CFR 1910.146; 29 CFR 1926 Subpart AA",
    text: "Sewer repair can mean confined spaces and contact with sewage; it is work for a trained crew. A push-camera inspection never needs anyone to enter the pipe.",
  });
  return out;
}
