import "server-only";

import { and, asc, desc, eq, inArray } from "drizzle-orm";

import { DISPUTE_OUTCOMES, DISPUTE_REASONS, type DisputeDto } from "@/lib/disputes";
import { AppError } from "@/lib/errors";
import { renderMail } from "@/lib/mail/render";

import { getDb } from "../client";
import { disputeMessages, disputes, listings, orders, users } from "../schema";
import { enqueueMail } from "./outbox";

export { DISPUTE_OUTCOMES, DISPUTE_REASONS };

type DisputeRow = typeof disputes.$inferSelect;

export const disputeDto = (d: DisputeRow): DisputeDto => ({
  id: d.id,
  status: d.status,
  reason: d.reason as DisputeDto["reason"],
  createdAt: d.createdAt.toISOString(),
  outcome: (d.outcome as DisputeDto["outcome"]) ?? null,
  outcomeNote: d.outcomeNote,
  closedAt: d.closedAt?.toISOString() ?? null,
});

/** The newest dispute this person opened on this report, as they may see it. */
export async function latestDisputeBy(orderId: string, userId: string): Promise<DisputeDto | null> {
  const db = await getDb();
  const [row] = await db
    .select()
    .from(disputes)
    .where(and(eq(disputes.orderId, orderId), eq(disputes.openedBy, userId)))
    .orderBy(desc(disputes.createdAt))
    .limit(1);
  return row ? disputeDto(row) : null;
}

export async function openDispute(opener: { id: string; email: string; name: string }, orderId: string, input: { reason: keyof typeof DISPUTE_REASONS; message: string }) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [existing] = await tx.select({ id: disputes.id }).from(disputes).where(and(eq(disputes.orderId, orderId), eq(disputes.openedBy, opener.id), eq(disputes.status, "open"))).limit(1);
    if (existing) throw new AppError("conflict", "You already have an open dispute on this report; we will reply by e-mail.");
    const [row] = await tx.insert(disputes).values({ orderId, openedBy: opener.id, reason: input.reason, message: input.message }).returning();
    const admins = await tx.select({ email: users.email }).from(users).where(eq(users.role, "admin"));
    for (const a of admins) {
      await enqueueMail({ key: `dispute:${row.id}:admin:${a.email}`, to: a.email, subject: `Dispute opened: ${DISPUTE_REASONS[input.reason]}`, ...renderMail({ heading: "A report was disputed", paragraphs: [`${opener.name} wrote: "${input.message}"`], action: { label: "Open the dispute queue", path: "/admin/disputes" } }) }, tx);
    }
    await enqueueMail({ key: `dispute:${row.id}:opened`, to: opener.email, subject: "We received your dispute", ...renderMail({ heading: "We are looking into it", paragraphs: ["An admin reads every dispute and replies by e-mail, usually within one working day."] }) }, tx);
    return row;
  });
}

export async function listDisputes(status?: "open" | "closed") {
  const db = await getDb();
  const rows = await db
    .select({ d: disputes, street: listings.street, city: listings.city, openerEmail: users.email, openerName: users.name, inspectorId: orders.inspectorId })
    .from(disputes)
    .innerJoin(orders, eq(orders.id, disputes.orderId))
    .innerJoin(listings, eq(listings.id, orders.listingId))
    .innerJoin(users, eq(users.id, disputes.openedBy))
    .where(status ? eq(disputes.status, status) : undefined)
    .orderBy(desc(disputes.createdAt))
    .limit(200);
  const ids = rows.map((r) => r.d.id);
  const messages = ids.length ? await db.select().from(disputeMessages).where(inArray(disputeMessages.disputeId, ids)).orderBy(asc(disputeMessages.createdAt)) : [];
  return rows.map((r) => ({
    id: r.d.id,
    orderId: r.d.orderId,
    address: `${r.street}, ${r.city}`,
    opener: { name: r.openerName, email: r.openerEmail },
    reason: r.d.reason,
    message: r.d.message,
    status: r.d.status,
    outcome: r.d.outcome,
    outcomeNote: r.d.outcomeNote,
    createdAt: r.d.createdAt.toISOString(),
    messages: messages.filter((m) => m.disputeId === r.d.id).map((m) => ({ id: m.id, to: m.toAddress, body: m.body, at: m.createdAt.toISOString() })),
  }));
}

async function loadDispute(id: string) {
  const db = await getDb();
  const [row] = await db
    .select({ d: disputes, openerEmail: users.email, inspectorId: orders.inspectorId, street: listings.street })
    .from(disputes)
    .innerJoin(users, eq(users.id, disputes.openedBy))
    .innerJoin(orders, eq(orders.id, disputes.orderId))
    .innerJoin(listings, eq(listings.id, orders.listingId))
    .where(eq(disputes.id, id))
    .limit(1);
  if (!row) throw new AppError("not_found", "That dispute was not found.");
  return row;
}

/** The admin writes to the inspector or to whoever opened the dispute; the message goes by e-mail through the outbox. */
export async function messageAboutDispute(admin: { id: string }, disputeId: string, input: { to: "inspector" | "opener"; body: string }) {
  const row = await loadDispute(disputeId);
  const db = await getDb();
  let to = row.openerEmail;
  if (input.to === "inspector") {
    if (!row.inspectorId) throw new AppError("conflict", "This order has no inspector.");
    const [inspector] = await db.select({ email: users.email }).from(users).where(eq(users.id, row.inspectorId));
    to = inspector.email;
  }
  return db.transaction(async (tx) => {
    const [m] = await tx.insert(disputeMessages).values({ disputeId, authorId: admin.id, toAddress: to, body: input.body }).returning();
    await enqueueMail({ key: `dispute-message:${m.id}`, to, subject: `About the report for ${row.street}`, ...renderMail({ heading: "A message from Gradeline about a disputed report", paragraphs: [input.body, "Reply to this e-mail to answer."] }) }, tx);
    return m;
  });
}

export async function closeDispute(admin: { id: string }, disputeId: string, input: { outcome: keyof typeof DISPUTE_OUTCOMES; note: string }) {
  const row = await loadDispute(disputeId);
  if (row.d.status === "closed") throw new AppError("conflict", "This dispute is already closed.");
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx.update(disputes).set({ status: "closed", outcome: input.outcome, outcomeNote: input.note, closedAt: new Date(), closedBy: admin.id }).where(eq(disputes.id, disputeId));
    await enqueueMail({ key: `dispute:${disputeId}:closed`, to: row.openerEmail, subject: `Dispute closed: ${DISPUTE_OUTCOMES[input.outcome]}`, ...renderMail({ heading: "We closed your dispute", paragraphs: [`Outcome: ${DISPUTE_OUTCOMES[input.outcome]}.`, input.note] }) }, tx);
  });
  return row.d.orderId;
}
