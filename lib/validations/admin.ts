import { z } from "zod";

import { RateTableSchema } from "@/lib/engine/rates";

const ROLES = ["agent", "inspector", "buyer", "admin"] as const;

/** Empty fields of a GET form mean "no filter". */
const blank = <S extends z.ZodType>(schema: S) => z.preprocess((v) => (v === "" ? undefined : v), schema.optional());
const note = z.string().trim().max(500, "Keep the note under 500 characters.");

export const verifyInspectorSchema = z
  .object({
    decision: z.enum(["approve", "reject"], { error: "Choose approve or reject." }),
    reason: z.string().trim().max(1000, "Keep the reason under 1,000 characters.").optional(),
  })
  .strict()
  .superRefine((v, ctx) => {
    if (v.decision === "reject" && (v.reason ?? "").length < 5) {
      ctx.addIssue({ code: "custom", path: ["reason"], message: "Say what the inspector must fix; the reason is e-mailed to them." });
    }
  });
export type VerifyInspectorInput = z.infer<typeof verifyInspectorSchema>;

export const adminInspectorsQuery = z.object({
  filter: z.enum(["queue", "all"]).default("all"),
});

const cents = (what: string) =>
  z
    .number({ error: `Enter the ${what}.` })
    .int({ error: "Use whole cents." })
    .min(0, { error: "Cannot be negative." })
    .max(10_000_000, { error: "That is over $100,000: check the figure." });
const bps = (what: string) =>
  z
    .number({ error: `Enter the ${what}.` })
    .int({ error: "Use at most two decimals of a percent." })
    .min(0, { error: "Cannot be negative." })
    .max(10_000, { error: "Cannot be over 100 %." });

/** A new version of the market's prices: cents and basis points (10000 = 100 %). */
export const priceVersionSchema = z
  .object({
    baseCents: cents("base price").min(100, { error: "The base price must be at least $1." }),
    noCleanoutCents: cents("no-cleanout add-on"),
    rushCents: cents("rush add-on"),
    extraSewerCents: cents("extra building sewer add-on"),
    reuseCents: cents("reuse price"),
    platformFeeBps: bps("platform fee"),
    reuseInspectorShareBps: bps("inspector's reuse share"),
    reuseFreshDays: z
      .number({ error: "Enter the number of days a report stays fresh." })
      .int({ error: "Use whole days." })
      .min(1, { error: "At least 1 day." })
      .max(730, { error: "At most 730 days: a report over two years old says little about the line today." }),
    sourceNote: note.optional(),
  })
  .strict();
export type PriceVersionInput = z.infer<typeof priceVersionSchema>;

/** A new version of the repair-cost rate table the engine uses. */
export const rateVersionSchema = z.object({ table: RateTableSchema, sourceNote: note.optional() }).strict();
export type RateVersionInput = z.input<typeof rateVersionSchema>;

export const userSearchQuery = z.object({
  q: blank(z.string().trim().max(100)),
  role: blank(z.enum(ROLES)),
  status: blank(z.enum(["active", "disabled"])),
  page: z.coerce.number().int().min(1).max(10_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
});
export type UserSearchQuery = z.infer<typeof userSearchQuery>;

export const updateUserSchema = z
  .object({
    disabled: z.boolean().optional(),
    role: z.enum(ROLES, { error: "Choose a role." }).optional(),
    reason: z.string().trim().max(500, "Keep the reason under 500 characters.").optional(),
  })
  .strict()
  .superRefine((v, ctx) => {
    if (v.disabled === undefined && v.role === undefined) ctx.addIssue({ code: "custom", path: ["_form"], message: "Nothing to change." });
    if (v.role !== undefined && (v.reason ?? "").length < 5) {
      ctx.addIssue({ code: "custom", path: ["reason"], message: "Give the reason for the role change; it is kept in the audit log." });
    }
  });
export type UpdateUserInput = z.infer<typeof updateUserSchema>;

const day = z.iso.date({ error: "Use a date like 2026-03-31." });

export const auditQuery = z
  .object({
    action: blank(
      z
        .string()
        .trim()
        .toLowerCase()
        .max(80)
        .regex(/^[a-z0-9_.]*$/, "Use an action or its start, like admin. or auth.sign_in."),
    ),
    actor: blank(z.string().trim().toLowerCase().max(320)),
    from: blank(day),
    to: blank(day),
    page: z.coerce.number().int().min(1).max(10_000).default(1),
    pageSize: z.coerce.number().int().min(1).max(200).default(50),
  })
  .superRefine((q, ctx) => {
    if (q.from && q.to && q.to < q.from) ctx.addIssue({ code: "custom", path: ["to"], message: "The end date is before the start date." });
  });
export type AuditQuery = z.infer<typeof auditQuery>;

export const userIdParams = z.object({ id: z.uuid("Not a valid id.") });
