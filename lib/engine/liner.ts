/**
 * Cured-in-place liner wall thickness, ASTM F1216 Appendix X1 (design considerations).
 * Thicknesses and diameters in inches, moduli and pressures in psi.
 */

// published: ASTM F1216 X1: enhancement factor K = 7, Poisson's ratio 0.3, factor of safety N = 2,
// minimum pipe stiffness E / (12 DR^3) >= 0.093 psi.
export const F1216 = { K: 7, poisson: 0.3, safetyFactor: 2, minStiffnessPsi: 0.093 } as const;
// published: fresh water weighs 0.433 psi per foot of head.
export const PSI_PER_FT_OF_WATER = 0.433;
// memory: 250,000 psi is the minimum initial flexural modulus F1216 asks of the liner (its Table 1).
// practice: half of it long-term, as in Najafi's worked example (Trenchless Technology Piping, 2010).
// A real design uses the resin maker's figures.
export const DEFAULT_SHORT_TERM_MODULUS_PSI = 250_000;
export const DEFAULT_LONG_TERM_MODULUS_PSI = 125_000;
// practice: a common F2561-based specification fails an installed wall under 87.5 % of the design.
export const INSTALLED_WALL_SHARE = 0.875;

/** published: F1216 X1 ovality reduction factor C = ((1 - q/100) / (1 + q/100)^2)^3, q in percent. */
export function ovalityFactor(ovalityPct: number): number {
  const q = ovalityPct / 100;
  return Math.pow((1 - q) / Math.pow(1 + q, 2), 3);
}

/** Thinnest wall meeting the minimum stiffness: from E / (12 DR^3) >= 0.093, t = D / DR. */
export function minStiffnessThickness(diameterIn: number, modulusPsi = DEFAULT_SHORT_TERM_MODULUS_PSI): number {
  const maxDr = Math.cbrt(modulusPsi / (12 * F1216.minStiffnessPsi));
  return diameterIn / maxDr;
}

export interface PartlyDeterioratedInput {
  diameterIn: number;
  /** Groundwater pressure at the pipe, psi. */
  groundwaterPsi: number;
  longTermModulusPsi?: number;
  ovalityPct?: number;
}

/**
 * published: F1216 X1, partly deteriorated host (the liner only resists groundwater):
 * t = D / ((2 K E_L C / (P N (1 - v^2)))^(1/3) + 1).
 */
export function partlyDeterioratedThickness({
  diameterIn,
  groundwaterPsi,
  longTermModulusPsi = DEFAULT_LONG_TERM_MODULUS_PSI,
  ovalityPct = 0,
}: PartlyDeterioratedInput): number {
  if (groundwaterPsi <= 0) return 0;
  const { K, poisson, safetyFactor } = F1216;
  const c = ovalityFactor(ovalityPct);
  const ratio = (2 * K * longTermModulusPsi * c) / (groundwaterPsi * safetyFactor * (1 - poisson * poisson));
  return diameterIn / (Math.cbrt(ratio) + 1);
}

export interface LinerWall {
  diameterIn: number;
  groundwaterHeadFt: number;
  groundwaterPsi: number;
  ovalityPct: number;
  minStiffnessIn: number;
  partlyDeterioratedIn: number;
  /** The thicker of the two: the wall a liner here needs. */
  designIn: number;
  /** An installed wall thinner than this fails a common acceptance specification. */
  installedAtLeastIn: number;
  basis: string;
}

/**
 * The liner wall for a stretch. practice: groundwater is taken at the ground surface, so the
 * head on the pipe is its depth; the worst case a buyer's estimate should carry.
 */
export function linerWall(diameterIn: number, depthFt: number, ovalityPct: number): LinerWall {
  const groundwaterPsi = PSI_PER_FT_OF_WATER * depthFt;
  const minStiffnessIn = minStiffnessThickness(diameterIn);
  const partlyDeterioratedIn = partlyDeterioratedThickness({ diameterIn, groundwaterPsi, ovalityPct });
  const designIn = Math.max(minStiffnessIn, partlyDeterioratedIn);
  return {
    diameterIn,
    groundwaterHeadFt: depthFt,
    groundwaterPsi,
    ovalityPct,
    minStiffnessIn,
    partlyDeterioratedIn,
    designIn,
    installedAtLeastIn: designIn * INSTALLED_WALL_SHARE,
    basis: "ASTM F1216 Appendix X1, partly deteriorated host, groundwater at the surface, E = 250,000 psi, E_L = 125,000 psi",
  };
}

// practice: a sectional liner covers a short stretch; past this a full-length liner is used.
export const SECTIONAL_MAX_FT = 25;

// published: scopes. F1216 inversion lining 4-108 in; F2561 main-and-lateral lining for laterals
// 3-12 in up to 150 ft; F2599 sectional lining 4-60 in.
export function liningStandardFor(diameterIn: number, lengthFt: number): string | null {
  if (diameterIn >= 4 && diameterIn <= 60 && lengthFt <= SECTIONAL_MAX_FT) return "an ASTM F2599 sectional liner";
  if (diameterIn >= 3 && diameterIn <= 12 && lengthFt <= 150) return "an ASTM F2561 lateral liner";
  if (diameterIn >= 4 && diameterIn <= 108) return "an ASTM F1216 liner";
  return null;
}
