/**
 * Where a rule or figure comes from, as the trade reference labels it:
 * published (a code, standard or paper), derived (follows from a formula),
 * practice (common in the trade, no source), memory (recalled, not re-checked: a default to confirm).
 */
export type Basis = "published" | "derived" | "practice" | "memory";

export const BASES = ["published", "derived", "practice", "memory"] as const satisfies readonly Basis[];
