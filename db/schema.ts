import { sql } from "drizzle-orm";
import {
  bigint,
  boolean,
  date,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";

export const roleEnum = pgEnum("role", ["agent", "inspector", "buyer", "admin"]);
export const orderStatusEnum = pgEnum("order_status", [
  "open",
  "accepted",
  "scheduled",
  "delivered",
  "unlocked",
  "cancelled",
  "refunded",
]);
export const mailStatusEnum = pgEnum("mail_status", ["pending", "sent", "failed"]);
/** aborted: an upload cancelled or swept before it finished; removed: a ready clip the inspector took out of the job. */
export const clipStatusEnum = pgEnum("clip_status", ["uploading", "ready", "rejected", "aborted", "removed"]);
export const disputeStatusEnum = pgEnum("dispute_status", ["open", "closed"]);
export const paymentStatusEnum = pgEnum("payment_status", ["pending", "paid", "expired", "refunded", "partially_refunded"]);
export const payoutStatusEnum = pgEnum("payout_status", ["waiting", "sent", "reversed", "partially_reversed"]);
export const ledgerKindEnum = pgEnum("ledger_kind", ["charge", "fee", "transfer", "refund", "reversal"]);
export const proposalStatusEnum = pgEnum("proposal_status", ["proposed", "confirmed", "declined", "withdrawn"]);

const createdAt = () => timestamp("created_at", { withTimezone: true }).notNull().defaultNow();

export const users = pgTable("users", {
  id: uuid("id").primaryKey().defaultRandom(),
  email: text("email").notNull().unique(),
  name: text("name").notNull(),
  role: roleEnum("role").notNull(),
  passwordHash: text("password_hash").notNull(),
  phone: text("phone"),
  company: text("company"),
  sessionVersion: integer("session_version").notNull().default(1),
  disabledAt: timestamp("disabled_at", { withTimezone: true }),
  createdAt: createdAt(),
});

export const authSessions = pgTable(
  "auth_sessions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    sessionVersion: integer("session_version").notNull(),
    ip: text("ip"),
    userAgent: text("user_agent"),
    createdAt: createdAt(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    revokedAt: timestamp("revoked_at", { withTimezone: true }),
  },
  (t) => [index("auth_sessions_user_idx").on(t.userId)],
);

export const inspectorProfiles = pgTable("inspector_profiles", {
  userId: uuid("user_id")
    .primaryKey()
    .references(() => users.id, { onDelete: "cascade" }),
  licenceNumber: text("licence_number"),
  licenceExpiresOn: date("licence_expires_on"),
  insuranceKey: text("insurance_key"),
  insuranceFileName: text("insurance_file_name"),
  baseLocation: text("base_location"),
  availability: jsonb("availability").$type<WeeklyAvailability>().notNull().default(sql`'{}'::jsonb`),
  verifiedAt: timestamp("verified_at", { withTimezone: true }),
  verifiedBy: uuid("verified_by").references(() => users.id),
  rejectedReason: text("rejected_reason"),
  payoutAccountId: text("payout_account_id"),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

export type WeeklyAvailability = Partial<Record<"mon" | "tue" | "wed" | "thu" | "fri" | "sat" | "sun", { start: string; end: string }[]>>;

export const serviceAreas = pgTable(
  "service_areas",
  {
    inspectorId: uuid("inspector_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    postalCode: text("postal_code").notNull(),
  },
  (t) => [primaryKey({ columns: [t.inspectorId, t.postalCode] }), index("service_areas_postal_idx").on(t.postalCode)],
);

export const listings = pgTable(
  "listings",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    street: text("street").notNull(),
    unit: text("unit"),
    city: text("city").notNull(),
    state: text("state").notNull(),
    postalCode: text("postal_code").notNull(),
    addressKey: text("address_key").notNull(),
    propertyType: text("property_type").notNull(),
    yearBuilt: integer("year_built"),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("listings_address_key_idx").on(t.addressKey)],
);

export type VisitWindow = { start: string; end: string };

export const orders = pgTable(
  "orders",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    listingId: uuid("listing_id")
      .notNull()
      .references(() => listings.id),
    agentId: uuid("agent_id")
      .notNull()
      .references(() => users.id),
    inspectorId: uuid("inspector_id").references(() => users.id),
    status: orderStatusEnum("status").notNull().default("open"),
    listingRef: text("listing_ref"),
    occupancy: text("occupancy").notNull(),
    accessNotes: text("access_notes").notNull(),
    cleanoutKnown: boolean("cleanout_known").notNull(),
    cleanoutNote: text("cleanout_note"),
    buildingSewers: integer("building_sewers").notNull().default(1),
    timeZone: text("time_zone").notNull(),
    deadline: timestamp("deadline", { withTimezone: true }).notNull(),
    visitWindows: jsonb("visit_windows").$type<VisitWindow[]>().notNull(),
    anyTimeInWindows: boolean("any_time_in_windows").notNull().default(false),
    buyerName: text("buyer_name").notNull(),
    buyerEmail: text("buyer_email").notNull(),
    buyerId: uuid("buyer_id").references(() => users.id),
    notes: text("notes"),
    priceCents: integer("price_cents").notNull(),
    platformFeeCents: integer("platform_fee_cents").notNull(),
    priceLines: jsonb("price_lines").$type<{ label: string; cents: number }[]>().notNull(),
    atRiskNotifiedAt: timestamp("at_risk_notified_at", { withTimezone: true }),
    /** Report reuse: this order sells the report of an earlier order of the same listing. */
    reuseOfOrderId: uuid("reuse_of_order_id"),
    appointmentStart: timestamp("appointment_start", { withTimezone: true }),
    appointmentEnd: timestamp("appointment_end", { withTimezone: true }),
    acceptedAt: timestamp("accepted_at", { withTimezone: true }),
    deliveredAt: timestamp("delivered_at", { withTimezone: true }),
    unlockedAt: timestamp("unlocked_at", { withTimezone: true }),
    cancelledAt: timestamp("cancelled_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("orders_agent_idx").on(t.agentId, t.createdAt),
    // The orders table's default view (soonest deadline first) reads 20 rows off this index in order.
    index("orders_agent_deadline_idx").on(t.agentId, t.deadline, t.id),
    index("orders_inspector_idx").on(t.inspectorId),
    index("orders_status_deadline_idx").on(t.status, t.deadline),
    index("orders_buyer_email_idx").on(t.buyerEmail),
    index("orders_listing_idx").on(t.listingId),
  ],
);

export const orderEvents = pgTable(
  "order_events",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id, { onDelete: "cascade" }),
    fromStatus: orderStatusEnum("from_status"),
    toStatus: orderStatusEnum("to_status").notNull(),
    actorId: uuid("actor_id").references(() => users.id),
    reason: text("reason"),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("order_events_order_idx").on(t.orderId, t.at)],
);

export const appointmentProposals = pgTable(
  "appointment_proposals",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id, { onDelete: "cascade" }),
    inspectorId: uuid("inspector_id")
      .notNull()
      .references(() => users.id),
    start: timestamp("start", { withTimezone: true }).notNull(),
    end: timestamp("end", { withTimezone: true }).notNull(),
    status: proposalStatusEnum("status").notNull().default("proposed"),
    createdAt: createdAt(),
  },
  (t) => [index("appointment_proposals_order_idx").on(t.orderId)],
);

/** A video clip of a job, uploaded by the browser straight to storage in presigned parts. */
export const clips = pgTable(
  "clips",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id, { onDelete: "cascade" }),
    inspectorId: uuid("inspector_id")
      .notNull()
      .references(() => users.id),
    status: clipStatusEnum("status").notNull().default("uploading"),
    label: text("label").notNull(),
    sizeBytes: bigint("size_bytes", { mode: "number" }).notNull(),
    declaredType: text("declared_type").notNull(),
    detectedType: text("detected_type"),
    objectKey: text("object_key").notNull().unique(),
    uploadId: text("upload_id"),
    partSizeBytes: integer("part_size_bytes").notNull(),
    partCount: integer("part_count").notNull(),
    durationSeconds: doublePrecision("duration_seconds"),
    startFootage: doublePrecision("start_footage"),
    posterKey: text("poster_key"),
    rejectedReason: text("rejected_reason"),
    createdAt: createdAt(),
    completedAt: timestamp("completed_at", { withTimezone: true }),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("clips_order_idx").on(t.orderId), index("clips_status_idx").on(t.status, t.updatedAt)],
);

/** A still frame taken from a clip (for a finding). */
export const stills = pgTable(
  "stills",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id, { onDelete: "cascade" }),
    clipId: uuid("clip_id").references(() => clips.id, { onDelete: "set null" }),
    second: doublePrecision("second"),
    objectKey: text("object_key").notNull().unique(),
    createdAt: createdAt(),
    /** Set once the stored bytes were read and found to be a JPEG or PNG; only verified stills reach a report. */
    verifiedAt: timestamp("verified_at", { withTimezone: true }),
  },
  (t) => [index("stills_order_idx").on(t.orderId)],
);

/** The inspector's record of a job: the draft the engine evaluates, and what was submitted. */
export const inspections = pgTable("inspections", {
  orderId: uuid("order_id")
    .primaryKey()
    .references(() => orders.id, { onDelete: "cascade" }),
  record: jsonb("record").$type<Record<string, unknown>>().notNull().default(sql`'{}'::jsonb`),
  narrative: text("narrative").notNull().default(""),
  recommendation: text("recommendation").notNull().default(""),
  revision: integer("revision").notNull().default(0),
  evaluation: jsonb("evaluation").$type<Record<string, unknown>>(),
  engineVersion: text("engine_version"),
  ratesId: text("rates_id"),
  submittedAt: timestamp("submitted_at", { withTimezone: true }),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

/** Prices of a market, versioned: each change is a new row; orders keep the lines they were priced with. */
export const priceSettings = pgTable(
  "price_settings",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    market: text("market").notNull(),
    baseCents: integer("base_cents").notNull(),
    noCleanoutCents: integer("no_cleanout_cents").notNull(),
    rushCents: integer("rush_cents").notNull(),
    extraSewerCents: integer("extra_sewer_cents").notNull(),
    reuseCents: integer("reuse_cents").notNull(),
    platformFeeBps: integer("platform_fee_bps").notNull(),
    reuseInspectorShareBps: integer("reuse_inspector_share_bps").notNull(),
    reuseFreshDays: integer("reuse_fresh_days").notNull().default(180),
    sourceNote: text("source_note"),
    createdBy: uuid("created_by").references(() => users.id),
    effectiveAt: timestamp("effective_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("price_settings_market_idx").on(t.market, t.effectiveAt)],
);

/** The repair-cost rate table the engine uses, versioned; each report keeps the id it was computed with. */
export const rateTables = pgTable(
  "rate_tables",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    market: text("market").notNull(),
    table: jsonb("table").$type<Record<string, unknown>>().notNull(),
    sourceNote: text("source_note"),
    createdBy: uuid("created_by").references(() => users.id),
    effectiveAt: timestamp("effective_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("rate_tables_market_idx").on(t.market, t.effectiveAt)],
);

/** One Checkout Session per row; a report is unlocked only by the provider's signed webhook. */
export const payments = pgTable(
  "payments",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id),
    buyerId: uuid("buyer_id")
      .notNull()
      .references(() => users.id),
    kind: text("kind").notNull().default("scope"),
    checkoutSessionId: text("checkout_session_id").unique(),
    paymentIntentId: text("payment_intent_id"),
    chargeId: text("charge_id"),
    amountCents: integer("amount_cents").notNull(),
    currency: text("currency").notNull().default("usd"),
    status: paymentStatusEnum("status").notNull().default("pending"),
    refundedCents: integer("refunded_cents").notNull().default(0),
    createdAt: createdAt(),
    paidAt: timestamp("paid_at", { withTimezone: true }),
  },
  (t) => [index("payments_order_idx").on(t.orderId), index("payments_buyer_idx").on(t.buyerId)],
);

/** Every provider event, recorded once by its id in the same transaction as its effect. */
export const webhookEvents = pgTable("webhook_events", {
  id: text("id").primaryKey(),
  type: text("type").notNull(),
  receivedAt: timestamp("received_at", { withTimezone: true }).notNull().defaultNow(),
  outcome: text("outcome").notNull(),
});

/** Who may read which report's rated summary. */
export const reportAccess = pgTable(
  "report_access",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id),
    paymentId: uuid("payment_id").references(() => payments.id),
    grantedAt: timestamp("granted_at", { withTimezone: true }).notNull().defaultNow(),
    revokedAt: timestamp("revoked_at", { withTimezone: true }),
  },
  (t) => [uniqueIndex("report_access_order_user_idx").on(t.orderId, t.userId)],
);

export const shareLinks = pgTable(
  "share_links",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id),
    createdBy: uuid("created_by")
      .notNull()
      .references(() => users.id),
    tokenHash: text("token_hash").notNull().unique(),
    label: text("label"),
    createdAt: createdAt(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    revokedAt: timestamp("revoked_at", { withTimezone: true }),
  },
  (t) => [index("share_links_order_idx").on(t.orderId)],
);

/** The inspector's share of a payment, sent once with an idempotency key tied to the payment. */
export const payouts = pgTable("payouts", {
  id: uuid("id").primaryKey().defaultRandom(),
  paymentId: uuid("payment_id")
    .notNull()
    .unique()
    .references(() => payments.id),
  inspectorId: uuid("inspector_id")
    .notNull()
    .references(() => users.id),
  amountCents: integer("amount_cents").notNull(),
  reversedCents: integer("reversed_cents").notNull().default(0),
  status: payoutStatusEnum("status").notNull().default("waiting"),
  transferId: text("transfer_id"),
  createdAt: createdAt(),
  sentAt: timestamp("sent_at", { withTimezone: true }),
});

/** Every money movement in integer cents. For each payment: charge = transfers + fees + refunds. */
export const ledgerEntries = pgTable(
  "ledger_entries",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id),
    paymentId: uuid("payment_id").references(() => payments.id),
    kind: ledgerKindEnum("kind").notNull(),
    amountCents: integer("amount_cents").notNull(),
    externalId: text("external_id"),
    note: text("note"),
    createdAt: createdAt(),
  },
  (t) => [index("ledger_order_idx").on(t.orderId), uniqueIndex("ledger_external_idx").on(t.kind, t.externalId)],
);

export const disputes = pgTable(
  "disputes",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id),
    openedBy: uuid("opened_by")
      .notNull()
      .references(() => users.id),
    reason: text("reason").notNull(),
    message: text("message").notNull(),
    status: disputeStatusEnum("status").notNull().default("open"),
    outcome: text("outcome"),
    outcomeNote: text("outcome_note"),
    createdAt: createdAt(),
    closedAt: timestamp("closed_at", { withTimezone: true }),
    closedBy: uuid("closed_by").references(() => users.id),
  },
  (t) => [index("disputes_status_idx").on(t.status, t.createdAt), index("disputes_order_idx").on(t.orderId)],
);

export const disputeMessages = pgTable(
  "dispute_messages",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    disputeId: uuid("dispute_id")
      .notNull()
      .references(() => disputes.id, { onDelete: "cascade" }),
    authorId: uuid("author_id")
      .notNull()
      .references(() => users.id),
    toAddress: text("to_address").notNull(),
    body: text("body").notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("dispute_messages_dispute_idx").on(t.disputeId, t.createdAt)],
);

export const mailOutbox = pgTable(
  "mail_outbox",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    dedupeKey: text("dedupe_key").notNull().unique(),
    toAddress: text("to_address").notNull(),
    subject: text("subject").notNull(),
    text: text("text").notNull(),
    html: text("html").notNull(),
    attachments: jsonb("attachments").$type<{ filename: string; contentType: string; content: string }[]>().notNull().default(sql`'[]'::jsonb`),
    status: mailStatusEnum("status").notNull().default("pending"),
    attempts: integer("attempts").notNull().default(0),
    nextAttemptAt: timestamp("next_attempt_at", { withTimezone: true }).notNull().defaultNow(),
    lastError: text("last_error"),
    createdAt: createdAt(),
    sentAt: timestamp("sent_at", { withTimezone: true }),
  },
  (t) => [index("mail_outbox_pending_idx").on(t.status, t.nextAttemptAt)],
);

export const auditLog = pgTable(
  "audit_log",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
    actorId: uuid("actor_id").references(() => users.id),
    action: text("action").notNull(),
    targetType: text("target_type"),
    targetId: text("target_id"),
    ip: text("ip"),
    data: jsonb("data").$type<Record<string, unknown>>().notNull().default(sql`'{}'::jsonb`),
  },
  (t) => [index("audit_log_at_idx").on(t.at), index("audit_log_action_idx").on(t.action)],
);

export type User = typeof users.$inferSelect;
export type Role = (typeof roleEnum.enumValues)[number];
export type OrderStatus = (typeof orderStatusEnum.enumValues)[number];
export type Order = typeof orders.$inferSelect;
export type Listing = typeof listings.$inferSelect;
export type AppointmentProposal = typeof appointmentProposals.$inferSelect;
export type PriceSettings = typeof priceSettings.$inferSelect;
export type Clip = typeof clips.$inferSelect;
export type Inspection = typeof inspections.$inferSelect;
export type Payment = typeof payments.$inferSelect;
