import { z } from "zod";

import { FINDING_TYPE_IDS } from "./finding-types";
import { ACCESS_KINDS, MATERIALS, SURFACES, SURVEY_END_REASONS } from "./vocabulary";

// "3", "12", "2-4", "10 to 2": an hour on the pipe's clock face seen looking downstream.
const CLOCK = /^(1[0-2]|0?[1-9])(\s*(-|to)\s*(1[0-2]|0?[1-9]))?$/;

const distance = (unit: string) => z.number({ error: `must be a distance in ${unit}` }).min(0, { error: "cannot be negative" });

const percent = z
  .number({ error: "must be a percentage" })
  .min(0, { error: "cannot be below 0 %" })
  .max(100, { error: "cannot be above 100 %" });

const orNull = <T extends z.ZodType>(schema: T) => schema.nullish().transform((v) => v ?? null);

const access = z.object({
  kind: z.enum(ACCESS_KINDS, { error: `must be one of ${ACCESS_KINDS.join(", ")}` }),
  note: z.string().max(2000).optional(),
});

const material = z.enum(MATERIALS, { error: `must be one of ${MATERIALS.join(", ")}` });

const surveyEnd = (unit: string) =>
  z.object({
    at: distance(unit),
    reason: z.enum(SURVEY_END_REASONS, { error: `must be one of ${SURVEY_END_REASONS.join(", ")}` }),
  });

const finding = (unit: string) =>
  z.object({
    at: distance(unit),
    to: orNull(distance(unit)),
    type: z.enum(FINDING_TYPE_IDS, { error: `must be one of ${FINDING_TYPE_IDS.join(", ")}` }),
    grade: z
      .number({ error: "must be a whole number from 1 to 5" })
      .int({ error: "must be a whole number from 1 to 5" })
      .min(1, { error: "must be from 1 to 5" })
      .max(5, { error: "must be from 1 to 5" }),
    clock: orNull(z.string().trim().regex(CLOCK, { error: 'must be an hour or a range such as "3" or "2-4"' })),
    lossPct: orNull(percent),
    waterDepthPct: orNull(percent),
    note: z.string().max(2000).optional(),
  });

const surface = z.enum(SURFACES, { error: `must be one of ${SURFACES.join(", ")}` });

/** The inspection record as the inspector's workspace sends it: feet and inches. */
export const InspectionRecordSchema = z.object({
  units: z.literal("imperial").optional(),
  access,
  segments: z
    .array(
      z.object({
        from: distance("feet"),
        to: distance("feet"),
        material,
        diameterIn: z.number({ error: "must be a diameter in inches" }).positive({ error: "must be above 0" }).max(120),
      }),
    )
    .min(1, { error: "the line profile needs at least one segment" }),
  surveyEnd: surveyEnd("feet"),
  boundaryAt: orNull(distance("feet")),
  locates: z.array(
    z.object({
      at: distance("feet"),
      depthFt: z.number({ error: "must be a depth in feet" }).min(0, { error: "a depth cannot be negative" }),
      groundElevationFt: orNull(z.number({ error: "must be an elevation in feet" })),
      surface,
    }),
  ),
  findings: z.array(finding("feet")),
});

/** The same record in metres and millimetres; field names that carry a unit carry the metric one. */
export const MetricInspectionRecordSchema = z.object({
  units: z.literal("metric"),
  access,
  segments: z
    .array(
      z.object({
        from: distance("metres"),
        to: distance("metres"),
        material,
        diameterMm: z.number({ error: "must be a diameter in millimetres" }).positive({ error: "must be above 0" }).max(3000),
      }),
    )
    .min(1, { error: "the line profile needs at least one segment" }),
  surveyEnd: surveyEnd("metres"),
  boundaryAt: orNull(distance("metres")),
  locates: z.array(
    z.object({
      at: distance("metres"),
      depthM: z.number({ error: "must be a depth in metres" }).min(0, { error: "a depth cannot be negative" }),
      groundElevationM: orNull(z.number({ error: "must be an elevation in metres" })),
      surface,
    }),
  ),
  findings: z.array(finding("metres")),
});

type ImperialOutput = z.output<typeof InspectionRecordSchema>;

/** A checked record in feet and inches: what every computation reads. */
export type InspectionRecord = Omit<ImperialOutput, "units">;
export type RecordInput = z.input<typeof InspectionRecordSchema>;
export type MetricRecordInput = z.input<typeof MetricInspectionRecordSchema>;
export type MetricRecord = z.output<typeof MetricInspectionRecordSchema>;
export type Segment = InspectionRecord["segments"][number];
export type Locate = InspectionRecord["locates"][number];
export type Finding = InspectionRecord["findings"][number];
export type SurveyEnd = InspectionRecord["surveyEnd"];
