import { z } from "zod";

import { BASES, type Basis } from "./basis";
import { deepFreeze } from "./freeze";

/** An exact slope in inches of fall per foot of run, kept as a fraction so the code's figure is never rounded. */
export interface InchesPerFoot {
  num: number;
  den: number;
}

export interface SlopeRow {
  /** The row applies to diameters below this many inches; null for "and larger". */
  belowDiameterIn: number | null;
  minimum: InchesPerFoot;
}

export interface SlopeRuleSet {
  id: string;
  name: string;
  source: string;
  basis: Basis;
  note?: string;
  rows: SlopeRow[];
}

export const SlopeRuleSetSchema = z.object({
  id: z.string().min(1),
  name: z.string().min(1),
  source: z.string().min(1),
  basis: z.enum(BASES),
  note: z.string().optional(),
  rows: z
    .array(
      z.object({
        belowDiameterIn: z.number().positive().nullable(),
        minimum: z.object({ num: z.number().int().positive(), den: z.number().int().positive() }),
      }),
    )
    .min(1)
    .refine((rows) => rows[rows.length - 1].belowDiameterIn === null, {
      error: "the last row must cover every larger diameter (belowDiameterIn: null)",
    }),
});

export const inPerFt = (f: InchesPerFoot): number => f.num / f.den;
export const fractionText = (f: InchesPerFoot): string => `${f.num}/${f.den}`;

// published: International Plumbing Code 2018/2021, Table 704.1 (slope of horizontal drainage piping):
// 2 1/2 in or less 1/4 in/ft, 3 to 6 in 1/8 in/ft, 8 in or larger 1/16 in/ft.
// practice: a diameter between two rows (2.75 in, 7 in) takes the stricter row.
export const IPC_704_1: SlopeRuleSet = deepFreeze({
  id: "ipc",
  name: "International Plumbing Code",
  source: "IPC 2018/2021, Table 704.1",
  basis: "published",
  rows: [
    { belowDiameterIn: 3, minimum: { num: 1, den: 4 } },
    { belowDiameterIn: 8, minimum: { num: 1, den: 8 } },
    { belowDiameterIn: null, minimum: { num: 1, den: 16 } },
  ],
});

// memory: Uniform Plumbing Code 708.1, recalled and not re-checked: 1/4 in/ft by default;
// 1/8 in/ft only for larger pipe where steeper is impractical and with the authority's approval.
// The engine applies the default; confirm locally.
export const UPC_708_1: SlopeRuleSet = deepFreeze({
  id: "upc",
  name: "Uniform Plumbing Code",
  source: "UPC 708.1 (recalled, confirm with the local authority)",
  basis: "memory",
  note: "1/8 in per ft is allowed for larger pipe only with the authority's approval; the default 1/4 in per ft is applied here.",
  rows: [{ belowDiameterIn: null, minimum: { num: 1, den: 4 } }],
});

export const SLOPE_RULE_SETS: Readonly<Record<string, SlopeRuleSet>> = { ipc: IPC_704_1, upc: UPC_708_1 };
export const DEFAULT_SLOPE_RULES = IPC_704_1;

export function minimumSlope(rules: SlopeRuleSet, diameterIn: number): InchesPerFoot {
  for (const row of rules.rows) {
    if (row.belowDiameterIn === null || diameterIn < row.belowDiameterIn) return row.minimum;
  }
  return rules.rows[rules.rows.length - 1].minimum;
}
