import { costBasis, methodCost } from "./costs";
import { describeFinding, listText } from "./format";
import { linerWall, type LinerWall } from "./liner";
import { REPAIR_METHODS, type MoneyRange, type RateTable, type RepairMethod } from "./rates";
import type { InspectionRecord } from "./record";
import { burstingFit, cleanFit, excavateFit, liningFit, noActionFit, spotFit, type Fit } from "./repair-rules";
import { stretchFacts, type StretchFacts } from "./stretches";
import type { Material, Side, Surface } from "./vocabulary";

export const METHOD_LABELS: Record<RepairMethod, string> = {
  no_action: "No action for now",
  clean_and_recheck: "Clean and re-check",
  spot_repair: "Spot repair",
  lining: "Lining",
  pipe_bursting: "Pipe bursting",
  excavate_replace: "Dig up and replace",
};

export interface RepairOption {
  method: RepairMethod;
  label: string;
  fits: boolean;
  /** Why it fits or not, in plain words. */
  reason: string;
  /** Favoured over the other fitting methods here (trenchless work under a hard surface). */
  favoured: boolean;
  /** Integer cents; null when the method does not fit. */
  costLowCents: number | null;
  costHighCents: number | null;
  /** Lining only: the liner wall by ASTM F1216 Appendix X1. */
  liner: LinerWall | null;
}

export interface Stretch {
  from: number;
  to: number;
  length: number;
  side: Side;
  /** Indices into the record's findings, every finding on the stretch. */
  findings: number[];
  /** What makes this stretch need work, in plain words. */
  why: string;
  materials: Material[];
  diametersIn: number[];
  depthFt: number;
  depthAssumed: boolean;
  surface: Surface;
  surfaceAssumed: boolean;
  options: RepairOption[];
  /** The fitting method the engine would price for negotiation: favoured first, then cheapest. */
  suggested: RepairMethod | null;
  /** Set on public stretches: whose work it is. */
  note: string | null;
}

export type CostBySide = Record<Side, MoneyRange>;

const sentence = (reasons: readonly string[]): string => {
  const text = reasons.join("; ");
  return text.charAt(0).toUpperCase() + text.slice(1) + ".";
};

function option(method: RepairMethod, fit: Fit, facts: StretchFacts, rates: RateTable, liner: LinerWall | null): RepairOption {
  const cost = fit.fits && method !== "no_action" ? methodCost(method, facts, rates) : null;
  const free = fit.fits && method === "no_action";
  return {
    method,
    label: METHOD_LABELS[method],
    fits: fit.fits,
    reason: sentence(fit.reasons),
    favoured: fit.fits && fit.favoured,
    costLowCents: free ? 0 : (cost?.lowCents ?? null),
    costHighCents: free ? 0 : (cost?.highCents ?? null),
    liner: method === "lining" ? liner : null,
  };
}

function suggest(options: readonly RepairOption[]): RepairMethod | null {
  const priced = options.filter((o) => o.fits && o.method !== "no_action");
  const pool = priced.some((o) => o.favoured) ? priced.filter((o) => o.favoured) : priced;
  let best: RepairOption | null = null;
  const mid = (o: RepairOption) => ((o.costLowCents ?? 0) + (o.costHighCents ?? 0)) / 2;
  for (const o of pool) if (best === null || mid(o) < mid(best)) best = o;
  return best ? best.method : null;
}

export function repairStretches(record: InspectionRecord, rates: RateTable): Stretch[] {
  return stretchFacts(record).map((facts) => {
    const basis = costBasis(facts, rates);
    const liner = linerWall(Math.max(...facts.diameters), basis.depthFt, facts.ovalityPct);
    const fits: Record<RepairMethod, Fit> = {
      no_action: noActionFit(facts),
      clean_and_recheck: cleanFit(facts),
      spot_repair: spotFit(facts, basis.surface, basis.depthFt),
      lining: liningFit(facts, basis.surface, liner),
      pipe_bursting: burstingFit(facts, basis.surface),
      excavate_replace: excavateFit(facts, basis.surface, basis.depthFt),
    };
    const options = REPAIR_METHODS.map((m) => option(m, fits[m], facts, rates, liner));
    const work = facts.workIndices.map((i) => describeFinding(record.findings[i]));
    return {
      from: facts.from,
      to: facts.to,
      length: facts.length,
      side: facts.side,
      findings: facts.findingIndices,
      why: listText(work),
      materials: facts.materials,
      diametersIn: facts.diameters,
      depthFt: basis.depthFt,
      depthAssumed: basis.depthAssumed,
      surface: basis.surface,
      surfaceAssumed: basis.surfaceAssumed,
      options,
      suggested: suggest(options),
      note:
        facts.side === "public"
          ? "Public side: this part belongs to the city or utility, which decides the repair. Report it to them."
          : null,
    };
  });
}

/** Cost of the suggested method on every stretch, added up by side. */
export function costBySide(stretches: readonly Stretch[]): CostBySide {
  const out: CostBySide = { private: { lowCents: 0, highCents: 0 }, public: { lowCents: 0, highCents: 0 } };
  for (const s of stretches) {
    const o = s.options.find((x) => x.method === s.suggested);
    if (!o) continue;
    out[s.side].lowCents += o.costLowCents ?? 0;
    out[s.side].highCents += o.costHighCents ?? 0;
  }
  return out;
}
