import { z } from "zod";

const isoWithOffset = z.iso.datetime({ offset: true, message: "Use a date and time with its offset, like 2026-12-09T17:00:00-08:00." });

export const addressSchema = z.object({
  street: z.string().trim().min(3, "Enter the street address.").max(200),
  unit: z.string().trim().max(40).optional(),
  city: z.string().trim().min(2, "Enter the city.").max(100),
  state: z
    .string()
    .trim()
    .toUpperCase()
    .regex(/^[A-Z]{2}$/, "Use the two-letter state code, like OR."),
  postalCode: z
    .string()
    .trim()
    .regex(/^\d{5}$/, "Use the five-digit postal code."),
});

export const visitWindowSchema = z
  .object({ start: isoWithOffset, end: isoWithOffset })
  .refine((w) => new Date(w.end) > new Date(w.start), { message: "A window must end after it starts.", path: ["end"] });

export const PROPERTY_TYPES = ["single_family", "townhouse", "condo", "multi_family"] as const;
export const OCCUPANCIES = ["vacant", "owner", "tenant"] as const;

export const PROPERTY_TYPE_LABELS: Record<(typeof PROPERTY_TYPES)[number], string> = {
  single_family: "Single-family house",
  townhouse: "Townhouse",
  condo: "Condominium",
  multi_family: "Multi-family (2-4 units)",
};
export const OCCUPANCY_LABELS: Record<(typeof OCCUPANCIES)[number], string> = {
  vacant: "Vacant",
  owner: "Owner-occupied",
  tenant: "Tenant-occupied",
};

export const createOrderSchema = z
  .object({
    address: addressSchema,
    listingRef: z.string().trim().max(60).optional(),
    propertyType: z.enum(PROPERTY_TYPES, { message: "Choose the property type." }),
    yearBuilt: z.number().int().min(1800, "Enter a year after 1800.").max(new Date().getFullYear() + 1, "The year built cannot be in the future.").optional(),
    occupancy: z.enum(OCCUPANCIES, { message: "Choose who lives there now." }),
    accessNotes: z.string().trim().min(5, "Say how the inspector gets in: lockbox, who to call.").max(1000),
    cleanoutKnown: z.boolean(),
    cleanoutNote: z.string().trim().max(500).optional(),
    buildingSewers: z.number().int().min(1).max(4).default(1),
    deadline: isoWithOffset,
    timeZone: z.string().max(60).default("America/Los_Angeles"),
    visitWindows: z.array(visitWindowSchema).min(1, "Give at least one window when the inspector may visit.").max(10),
    anyTimeInWindows: z.boolean(),
    buyer: z.object({
      name: z.string().trim().min(2, "Enter the buyer's name.").max(120),
      email: z.string().trim().toLowerCase().email("Enter the buyer's e-mail: the report invitation goes there.").max(320),
    }),
    notes: z.string().trim().max(2000).optional(),
  })
  .strict()
  .superRefine((o, ctx) => {
    const deadline = new Date(o.deadline);
    if (deadline.getTime() <= Date.now()) {
      ctx.addIssue({ code: "custom", path: ["deadline"], message: "The contingency deadline has passed. Check the date, or ask the seller's side for an extension first." });
    }
    o.visitWindows.forEach((w, i) => {
      if (new Date(w.start) >= deadline) ctx.addIssue({ code: "custom", path: ["visitWindows", i, "start"], message: "This window starts after the deadline." });
    });
    if (o.cleanoutKnown && !o.cleanoutNote) ctx.addIssue({ code: "custom", path: ["cleanoutNote"], message: "Say where the cleanout is, so the inspector can find it." });
  });

export type CreateOrderInput = z.infer<typeof createOrderSchema>;

export const quoteSchema = z.object({
  address: z.object({ street: z.string().trim().max(200), unit: z.string().trim().max(40).optional() }).optional(),
  postalCode: z.string().trim().regex(/^\d{5}$/, "Use the five-digit postal code."),
  cleanoutKnown: z.boolean(),
  buildingSewers: z.number().int().min(1).max(4).default(1),
  deadline: isoWithOffset,
});

export const ORDER_STATES = ["open", "accepted", "scheduled", "delivered", "unlocked", "cancelled", "refunded"] as const;

export const listOrdersQuery = z.object({
  status: z.enum([...ORDER_STATES, "at_risk"]).optional(),
  q: z.string().trim().max(100).optional(),
  sort: z.enum(["deadline", "created", "address", "status", "price"]).default("deadline"),
  dir: z.enum(["asc", "desc"]).default("asc"),
  page: z.coerce.number().int().min(1).max(10_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
});

export const reasonSchema = z.object({ reason: z.string().trim().min(3, "Give a short reason; it is recorded and sent to the people involved.").max(500) });

export const proposeSchema = z.object({
  slots: z
    .array(visitWindowSchema)
    .min(1, "Propose at least one visit time.")
    .max(5, "Propose at most five times."),
});

export const confirmAppointmentSchema = z.object({ proposalId: z.uuid("Choose one of the proposed times.") });

export const idParams = z.object({ id: z.uuid("Not a valid id.") });

export const WEEKDAYS = ["mon", "tue", "wed", "thu", "fri", "sat", "sun"] as const;
const hhmm = z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, "Use 24-hour time, like 08:30.");

export const inspectorProfileSchema = z.object({
  licenceNumber: z.string().trim().min(3, "Enter your licence number.").max(60),
  licenceExpiresOn: z.iso.date("Use a date like 2027-06-30."),
  baseLocation: z.string().trim().min(2, "Say where you start your day from.").max(120),
  postalCodes: z
    .array(z.string().trim().regex(/^\d{5}$/, "Each postal code has five digits."))
    .min(1, "Add at least one postal code you serve.")
    .max(200),
  availability: z.partialRecord(z.enum(WEEKDAYS), z.array(z.object({ start: hhmm, end: hhmm })).max(4)),
});

export type InspectorProfileInput = z.infer<typeof inspectorProfileSchema>;

export const insuranceUploadSchema = z.object({
  fileName: z.string().trim().min(1).max(200),
  sizeBytes: z.number().int().min(1, "The file is empty.").max(10 * 1024 * 1024, "Keep the certificate under 10 MB."),
  contentType: z.enum(["application/pdf", "image/png", "image/jpeg"], { message: "Upload a PDF, PNG or JPEG." }),
});

export const reuseOrderSchema = z.object({
  sourceOrderId: z.uuid("Choose the report to reuse."),
  buyer: z.object({
    name: z.string().trim().min(2, "Enter the buyer's name.").max(120),
    email: z.string().trim().toLowerCase().email("Enter the buyer's e-mail: the report invitation goes there.").max(320),
  }),
  timeZone: z.string().max(60).default("America/Los_Angeles"),
});
