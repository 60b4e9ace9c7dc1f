import { CLEARED_BEFORE_LINING } from "./finding-types";
import { depthBand, METHOD_KIND, type CostedMethod, type MoneyRange, type RateTable } from "./rates";
import type { StretchFacts } from "./stretches";
import type { Surface } from "./vocabulary";

// Estimates for negotiation: to the next $50 outward, so a range never looks like a quote.
const ROUND_CENTS = 5_000;

export interface CostBasis {
  depthFt: number;
  depthAssumed: boolean;
  surface: Surface;
  surfaceAssumed: boolean;
}

export function costBasis(facts: StretchFacts, rates: RateTable): CostBasis {
  return {
    depthFt: facts.depthFt ?? rates.assumedDepthFt,
    depthAssumed: facts.depthFt === null,
    surface: facts.surface ?? rates.assumedSurface,
    surfaceAssumed: facts.surface === null,
  };
}

function base(method: CostedMethod, lengthFt: number, basis: CostBasis, rates: RateTable): { low: number; high: number } {
  const rate = rates.methods[method];
  const kind = METHOD_KIND[method];
  const feet = Math.max(lengthFt, rate.minimumFt);
  const band = depthBand(rates, basis.depthFt);
  const surface = rates.surfaces[basis.surface];
  const factor =
    kind === "excavation" ? band.excavation * surface.excavation : kind === "trenchless" ? band.trenchless * surface.trenchless : 1;
  const restoration = kind === "excavation" ? surface.restoration : { lowCents: 0, highCents: 0 };
  return {
    low: (rate.fixed.lowCents + rate.perFoot.lowCents * feet) * factor + restoration.lowCents,
    high: (rate.fixed.highCents + rate.perFoot.highCents * feet) * factor + restoration.highCents,
  };
}

/** Cost range of one method on one stretch: fixed plus per-foot, times depth and surface, plus restoration. */
export function methodCost(method: CostedMethod, facts: StretchFacts, rates: RateTable): MoneyRange {
  const basis = costBasis(facts, rates);
  const cost = base(method, facts.length, basis, rates);
  if (method === "lining") {
    if (facts.diameters.length > 1) {
      cost.low += rates.transitionLiner.lowCents;
      cost.high += rates.transitionLiner.highCents;
    }
    // practice: roots, deposits and scale come out before the liner goes in; that crew is paid too.
    if (facts.findings.some((f) => CLEARED_BEFORE_LINING.includes(f.type))) {
      const clean = base("clean_and_recheck", facts.length, basis, rates);
      cost.low += clean.low;
      cost.high += clean.high;
    }
  }
  return {
    lowCents: Math.floor(cost.low / ROUND_CENTS) * ROUND_CENTS,
    highCents: Math.ceil(cost.high / ROUND_CENTS) * ROUND_CENTS,
  };
}
