import { describeFinding, ftRange, ftText, inText, listText, pctText, sizeText, wallText } from "./format";
import { liningStandardFor, type LinerWall } from "./liner";
import type { Finding } from "./record";
import { PROTECTIVE_SYSTEM_DEPTH_FT } from "./safety";
import { isStructural, needsWork, ofType, type StretchFacts } from "./stretches";
import { SURFACE_LABELS, type Surface } from "./vocabulary";

// practice: a sag holding water over a quarter of the diameter keeps lining out (a liner follows
// the old pipe and keeps the belly).
export const LINING_MAX_SAG_WATER_PCT = 25;
// practice: heavier deformation than this keeps lining out.
export const LINING_MAX_OVALITY_PCT = 10;
// practice: offset or separated joints this bad are too large for a liner to bridge.
export const LARGE_OFFSET_GRADE = 4;
// practice: a break or hole at grade 5 means pipe wall is missing; there is no host to line.
export const MISSING_PIPE_GRADE = 5;
// practice: a spot repair digs one pit and replaces at most this much pipe.
export const SPOT_REPAIR_MAX_FT = 10;

export interface Fit {
  fits: boolean;
  favoured: boolean;
  reasons: string[];
}

// practice: under concrete, a street or a building, trenchless work is favoured: nothing to break and restore.
const HARD: readonly Surface[] = ["hardscape", "street", "under_building"];
export const isHard = (s: Surface): boolean => HARD.includes(s);
const at = (fs: readonly Finding[]) => listText(fs.map((f) => ftText(f.at)));
// practice: cleaning removes what is in the pipe; it mends nothing.
const CLEANABLE = ["roots", "deposits", "grease", "obstruction"] as const;

export function noActionFit(facts: StretchFacts): Fit {
  const failing = facts.findings.filter((f) => f.grade > 3 || f.type === "collapse");
  if (failing.length > 0) return { fits: false, favoured: false, reasons: [`the ${describeFinding(failing[0])} needs work`] };
  if (facts.stoppedHere)
    return {
      fits: false,
      favoured: false,
      reasons: [`the camera could not get past ${ftText(facts.stopAt)}: the line there has to be opened up and seen`],
    };
  // practice: grade 3 findings can be watched and scoped again in a year or two.
  return { fits: true, favoured: false, reasons: ["nothing here is failing yet: it can be watched and scoped again in a year or two"] };
}

export function cleanFit(facts: StretchFacts): Fit {
  const work = facts.findings.filter(needsWork);
  const unmendable = work.filter((f) => !(CLEANABLE as readonly string[]).includes(f.type));
  const roots = ofType(facts, "roots");
  if (unmendable.length > 0) {
    return {
      fits: false,
      favoured: false,
      reasons: [`cleaning will not mend the ${describeFinding(unmendable[0])}; it is done before any repair anyway`],
    };
  }
  const reasons = [
    roots.length > 0
      ? "cut the roots and jet the line, then scope it again to see the pipe behind them"
      : "jet the line clean, then scope it again to see the pipe underneath",
  ];
  if (roots.length > 0) reasons.push("roots grow back through the same joints: expect to repeat this every year or two");
  return { fits: true, favoured: false, reasons };
}

function surfaceWords(surface: Surface): string {
  if (surface === "street") return "it means digging in the street, with a permit and traffic control";
  if (surface === "under_building") return "it means opening the floor of the building";
  return "the concrete or pavers on top are broken and then restored";
}

function digReasons(facts: StretchFacts, surface: Surface, depthFt: number, what: string): string[] {
  const reasons = [what];
  if (isHard(surface)) reasons.push(`${surfaceWords(surface)}; a trenchless method is favoured where one fits`);
  if (depthFt >= PROTECTIVE_SYSTEM_DEPTH_FT)
    reasons.push(`at ${ftText(depthFt)} deep the trench needs shoring or a shield (OSHA 29 CFR 1926.652)`);
  return reasons;
}

export function spotFit(facts: StretchFacts, surface: Surface, depthFt: number): Fit {
  if (facts.length > SPOT_REPAIR_MAX_FT) {
    return {
      fits: false,
      favoured: false,
      reasons: [`the stretch is ${ftText(facts.length)} long; a spot repair replaces ${ftText(SPOT_REPAIR_MAX_FT)} at most`],
    };
  }
  return {
    fits: true,
    favoured: false,
    reasons: digReasons(facts, surface, depthFt, `dig one pit and replace about ${ftText(facts.length)} of pipe`),
  };
}

export function excavateFit(facts: StretchFacts, surface: Surface, depthFt: number): Fit {
  const what = `dig a trench along ${ftRange(facts.from, facts.to)} and lay new pipe at a true grade; it mends sags, collapses and offsets alike`;
  return { fits: true, favoured: false, reasons: digReasons(facts, surface, depthFt, what) };
}

/** Reasons that keep every trenchless method out of a stretch. */
function trenchlessBlocks(facts: StretchFacts): string[] {
  const out: string[] = [];
  const collapses = ofType(facts, "collapse");
  // practice: a collapse leaves no open pipe to pull or push anything through.
  if (collapses.length > 0)
    out.push(`the collapse at ${at(collapses)} rules out trenchless methods here: there is no open pipe to work through`);
  if (facts.stoppedHere && collapses.length === 0)
    out.push(`the camera could not get past ${ftText(facts.stopAt)}: clear the line and scope it end to end first`);
  return out;
}

function bigSags(facts: StretchFacts): Finding[] {
  return ofType(facts, "sag").filter((f) => (f.waterDepthPct ?? 0) > LINING_MAX_SAG_WATER_PCT);
}

export function liningFit(facts: StretchFacts, surface: Surface, liner: LinerWall): Fit {
  const blocks = trenchlessBlocks(facts);
  for (const sag of bigSags(facts)) {
    blocks.push(
      `the sag ${sag.to !== null && sag.to > sag.at ? `from ${ftText(sag.at)} to ${ftText(sag.to)}` : `at ${ftText(sag.at)}`} holds water ${pctText(sag.waterDepthPct ?? 0)} of the diameter deep, over a quarter: a liner follows the old pipe and keeps the belly`,
    );
  }
  const missing = ofType(facts, "break_or_hole").filter((f) => f.grade >= MISSING_PIPE_GRADE);
  if (missing.length > 0) blocks.push(`pipe wall is missing at ${at(missing)}: a liner needs a host pipe around it`);
  if (facts.ovalityMeasured && facts.ovalityPct > LINING_MAX_OVALITY_PCT)
    blocks.push(`the pipe is deformed by ${pctText(facts.ovalityPct)}, more than a liner suits (${pctText(LINING_MAX_OVALITY_PCT)})`);
  const offsets = ofType(facts, "offset_joint", "separated_joint").filter((f) => f.grade >= LARGE_OFFSET_GRADE);
  if (offsets.length > 0) blocks.push(`the joint offset at ${at(offsets)} is too large for a liner to bridge`);
  const dMin = Math.min(...facts.diameters);
  const dMax = Math.max(...facts.diameters);
  const standard = liningStandardFor(dMin, facts.length) && liningStandardFor(dMax, facts.length);
  const sizes = dMin === dMax ? sizeText(dMin) : `${inText(dMin)} to ${sizeText(dMax)}`;
  if (!standard)
    blocks.push(`no lining standard covers ${sizes} pipe over ${ftText(facts.length)} (ASTM F1216: 4-108 in; F2561: 3-12 in up to 150 ft)`);
  if (blocks.length > 0) return { fits: false, favoured: false, reasons: blocks };

  const reasons = [
    `line ${ftRange(facts.from, facts.to)} from inside with ${standard}; its wall must be at least ${wallText(liner.designIn)} thick (ASTM F1216 Appendix X1)`,
  ];
  if (ofType(facts, "roots").length > 0) reasons.push("the roots are cut out first");
  const dirt = ofType(facts, "deposits", "grease", "obstruction", "corrosion_or_scale");
  if (dirt.length > 0) reasons.push("deposits and scale are cleaned out first");
  if (facts.diameters.length > 1)
    reasons.push(
      `the diameter changes from ${inText(facts.diameters[0])} to ${inText(facts.diameters[facts.diameters.length - 1])} here: it needs a transition liner`,
    );
  for (const sag of ofType(facts, "sag"))
    if ((sag.waterDepthPct ?? 0) > 0) reasons.push(`the liner keeps the small sag at ${ftText(sag.at)}, where water will still stand`);
  const favoured = isHard(surface);
  if (favoured) reasons.push(`under ${SURFACE_LABELS[surface]} lining avoids breaking the surface`);
  return { fits: true, favoured, reasons };
}

export function burstingFit(facts: StretchFacts, surface: Surface): Fit {
  const blocks = trenchlessBlocks(facts);
  // practice: the new pipe follows the old pipe's path, so a deep belly stays.
  for (const sag of bigSags(facts))
    blocks.push(
      `the new pipe follows the old path, so the sag at ${ftText(sag.at)} (water ${pctText(sag.waterDepthPct ?? 0)} of the diameter) would stay`,
    );
  if (blocks.length > 0) return { fits: false, favoured: false, reasons: blocks };
  const reasons = [
    `pull a new pipe through the old one, bursting it outward; it needs a pit at each end, at about ${ftText(facts.from)} and ${ftText(facts.to)}`,
  ];
  if (facts.diameters.length > 1) reasons.push("the new pipe can be one size throughout");
  if (facts.findings.some(isStructural) === false)
    reasons.push("nothing structural was found here: replacing pipe may be more than it needs");
  const favoured = isHard(surface);
  if (favoured) reasons.push(`under ${SURFACE_LABELS[surface]} only the two pits are dug`);
  return { fits: true, favoured, reasons };
}
