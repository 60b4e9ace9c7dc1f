import { z } from "zod";

const MAX_RECORD_BYTES = 512 * 1024;

/** A draft may be incomplete; only its size and outer shape are checked here (the engine checks the rest on submit). */
export const draftSchema = z.object({
  record: z
    .record(z.string(), z.unknown())
    .refine((r) => JSON.stringify(r).length <= MAX_RECORD_BYTES, "The record is too large to save (over 512 kB)."),
  narrative: z.string().max(20_000, "Keep the narrative under 20,000 characters."),
  recommendation: z.string().max(5_000, "Keep the recommendation under 5,000 characters.").default(""),
  baseRevision: z.number().int().min(0),
});

export const evaluateSchema = z.object({ record: z.unknown() });

export const submitSchema = z.object({ baseRevision: z.number().int().min(1, "Save the record before submitting.") });
