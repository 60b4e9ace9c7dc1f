import { z } from "zod";

import { deepFreeze } from "./freeze";
import { SURFACES, type Surface } from "./vocabulary";

export const REPAIR_METHODS = ["no_action", "clean_and_recheck", "spot_repair", "lining", "pipe_bursting", "excavate_replace"] as const;
export type RepairMethod = (typeof REPAIR_METHODS)[number];
export type CostedMethod = Exclude<RepairMethod, "no_action">;
export const COSTED_METHODS = REPAIR_METHODS.filter((m): m is CostedMethod => m !== "no_action");

export type WorkKind = "none" | "cleaning" | "excavation" | "trenchless";
export const METHOD_KIND: Record<RepairMethod, WorkKind> = {
  no_action: "none",
  clean_and_recheck: "cleaning",
  spot_repair: "excavation",
  lining: "trenchless",
  pipe_bursting: "trenchless",
  excavate_replace: "excavation",
};

const cents = z.number().int({ error: "must be whole cents" }).min(0, { error: "cannot be negative" });
const MoneyRangeSchema = z
  .object({ lowCents: cents, highCents: cents })
  .refine((r) => r.lowCents <= r.highCents, { error: "the low figure cannot be above the high one", path: ["highCents"] });
const factor = z.number().positive({ error: "must be above 0" }).max(20);

const MethodRateSchema = z.object({
  fixed: MoneyRangeSchema,
  perFoot: MoneyRangeSchema,
  /** Shorter work is priced as this many feet: a crew and its set-up cost the same for 1 ft or 4. */
  minimumFt: z.number().min(0),
});

const SurfaceRateSchema = z.object({
  excavation: factor,
  trenchless: factor,
  /** Breaking and restoring the surface, permits, traffic control: added to excavation work. */
  restoration: MoneyRangeSchema,
});

const DepthBandSchema = z.object({ fromFt: z.number().min(0), excavation: factor, trenchless: factor });

export const RateTableSchema = z.object({
  name: z.string().min(1),
  currency: z.literal("USD"),
  /** The day these rates were set, YYYY-MM-DD. */
  effectiveDate: z.iso.date({ error: "must be a date, YYYY-MM-DD" }),
  /** Where the figures come from; demo tables say so. */
  source: z.string().min(1),
  demo: z.boolean(),
  methods: z.object({
    clean_and_recheck: MethodRateSchema,
    spot_repair: MethodRateSchema,
    lining: MethodRateSchema,
    pipe_bursting: MethodRateSchema,
    excavate_replace: MethodRateSchema,
  }),
  /** Added to lining where the diameter changes inside the stretch. */
  transitionLiner: MoneyRangeSchema,
  depthBands: z
    .array(DepthBandSchema)
    .min(1)
    .refine((b) => b[0].fromFt === 0, { error: "the first depth band must start at 0 ft" })
    .refine((b) => b.every((band, i) => i === 0 || band.fromFt > b[i - 1].fromFt), {
      error: "depth bands must go deeper one after another",
    }),
  surfaces: z.object(Object.fromEntries(SURFACES.map((s) => [s, SurfaceRateSchema])) as Record<Surface, typeof SurfaceRateSchema>),
  /** Depth used where no locate mark gives one. */
  assumedDepthFt: z.number().min(0),
  /** Surface used where no locate mark says what is on top. */
  assumedSurface: z.enum(SURFACES),
});

export type RateTable = z.output<typeof RateTableSchema>;
export type MoneyRange = RateTable["transitionLiner"];
export type MethodRate = RateTable["methods"]["lining"];
export type DepthBand = RateTable["depthBands"][number];

const range = (low: number, high: number): MoneyRange => ({ lowCents: low * 100, highCents: high * 100 });

/**
 * DEMO rates, invented for the demo world. They sit inside the sanity bounds of municipal
 * guidance (California pages, read 2026): a 35-40 ft lateral by open trench about
 * $4,000-$15,000, trenchless $3,000-$11,000, an inspection $300-$800. Real rates are an admin
 * setting with their own date and source.
 */
export const DEMO_RATE_TABLE: RateTable = deepFreeze({
  name: "Demo rates (invented)",
  currency: "USD",
  effectiveDate: "2026-01-15",
  source:
    "Demo values invented for the demo world, kept within the sanity bounds of municipal lateral-repair guidance (California, read 2026). Not a quote.",
  demo: true,
  methods: {
    clean_and_recheck: { fixed: range(350, 750), perFoot: range(2, 5), minimumFt: 0 },
    spot_repair: { fixed: range(1_500, 3_000), perFoot: range(150, 350), minimumFt: 4 },
    lining: { fixed: range(1_500, 3_000), perFoot: range(60, 180), minimumFt: 4 },
    pipe_bursting: { fixed: range(2_000, 3_500), perFoot: range(50, 170), minimumFt: 10 },
    excavate_replace: { fixed: range(1_500, 3_500), perFoot: range(90, 250), minimumFt: 10 },
  },
  transitionLiner: range(400, 900),
  depthBands: [
    { fromFt: 0, excavation: 1, trenchless: 1 },
    { fromFt: 4, excavation: 1.25, trenchless: 1.05 },
    { fromFt: 6, excavation: 1.6, trenchless: 1.1 },
    { fromFt: 8, excavation: 2, trenchless: 1.15 },
    { fromFt: 12, excavation: 2.6, trenchless: 1.25 },
  ],
  surfaces: {
    soil: { excavation: 1, trenchless: 1, restoration: range(0, 0) },
    hardscape: { excavation: 1.3, trenchless: 1.05, restoration: range(500, 1_500) },
    street: { excavation: 1.6, trenchless: 1.15, restoration: range(2_500, 6_000) },
    under_building: { excavation: 1.8, trenchless: 1.1, restoration: range(2_000, 5_000) },
  },
  // practice: 4 ft is a middle guess between mild-climate (1.5-2.5 ft) and cold-climate (4-8 ft) cover.
  assumedDepthFt: 4,
  assumedSurface: "soil",
});

export function depthBand(rates: RateTable, depthFt: number): DepthBand {
  let band = rates.depthBands[0];
  for (const b of rates.depthBands) if (depthFt >= b.fromFt) band = b;
  return band;
}
