// Grows the demo world to a realistic size for the benchmarks: 2,000 orders in all, 200 of them the
// demo agent's (the orders table P1 measures) and 300 delivered reports. Everything is invented.
import { eq } from "drizzle-orm";

import { getDb } from "@/db/client";
import { PATHS } from "@/db/seed";
import { listingAddressKey } from "@/db/queries/order-commands";
import { inspections, ledgerEntries, listings, orderEvents, orders, type OrderStatus, payments, payouts, reportAccess, users } from "@/db/schema";
import { hashPassword } from "@/lib/auth/password";
import { DEMO_TOWN } from "@/lib/demo-world";
import { CLAY_LATERAL_1950S, DEMO_RATE_TABLE, evaluate, PVC_LATERAL_1990S } from "@/lib/engine";

export const BENCH_TOTALS = { orders: 2000, measuredAgentOrders: 200, reports: 300 };
export const MEASURED_AGENT = "agent@gradeline.test";

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
const STREETS = ["Millrace", "Tannery", "Ferrule", "Quarry Hill", "Kilnworks", "Bellwether", "Sluice Gate", "Lantern", "Alder Bend", "Cooper's Ford", "Weir", "Spillway", "Flume", "Cistern", "Culvert", "Headrace"];
const SUFFIXES = ["Lane", "Road", "Court", "Avenue", "Way", "Street", "Drive", "Place"];
const POSTAL = ["97990", "97991", "97992", "97993", "97994"];
const FIRST = ["Arlo", "Bea", "Cato", "Della", "Emrys", "Fenna", "Gideon", "Hollis", "Isolde", "Jory", "Kestrel", "Linnea", "Mabry", "Niamh", "Orrin", "Perpetua"];
const LAST = ["Ashgrove", "Brindle", "Culverhouse", "Dunmere", "Eddlestone", "Fallowby", "Gorsewood", "Hartsill", "Inchcombe", "Juniperry", "Kettlebury", "Larkwell"];
const INSPECTORS = ["inspector@gradeline.test", "inspector2@gradeline.test", "inspector3@gradeline.test"];
const CHUNK = 250;

// A fixed-seed generator, so every run seeds the same world.
function lcg(seed: number) {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

async function insertChunked<T>(rows: T[], insert: (chunk: T[]) => Promise<unknown>) {
  for (let i = 0; i < rows.length; i += CHUNK) await insert(rows.slice(i, i + CHUNK));
}

/** The status of the i-th bench order: the first `reports` are delivered or unlocked, the rest a live mix. */
function statusFor(i: number, reports: number, rnd: () => number): OrderStatus {
  if (i < reports) return i % 2 === 0 ? "unlocked" : "delivered";
  const r = rnd();
  return r < 0.25 ? "open" : r < 0.45 ? "accepted" : r < 0.7 ? "scheduled" : "cancelled";
}

/** Adds the bench orders once; a second call finds them and changes nothing. */
export async function seedBenchWorld(now = new Date()): Promise<{ orders: number; reports: number; measuredAgentOrders: number }> {
  const db = await getDb();
  const rnd = lcg(20260301);
  const byEmail = new Map((await db.select({ id: users.id, email: users.email }).from(users)).map((u) => [u.email, u.id]));
  const agentId = byEmail.get(MEASURED_AGENT);
  if (!agentId) throw new Error("Seed the demo world before the bench world.");
  const counted = async () => {
    const all = await db.$count(orders);
    const mine = await db.$count(orders, eq(orders.agentId, agentId));
    const reports = await db.$count(inspections);
    return { orders: all, reports, measuredAgentOrders: mine };
  };
  if (byEmail.has("bench-agent-1@gradeline.test")) return counted();

  const passwordHash = await hashPassword(`bench-${Math.random()}`);
  const person = (i: number) => `${FIRST[i % FIRST.length]} ${LAST[Math.floor(i / FIRST.length) % LAST.length]}`;
  const newUsers = [
    ...Array.from({ length: 8 }, (_, i) => ({ email: `bench-agent-${i + 1}@gradeline.test`, name: person(i * 5 + 3), role: "agent" as const, company: `${LAST[i % LAST.length]} Realty`, passwordHash })),
    ...Array.from({ length: 30 }, (_, i) => ({ email: `bench-buyer-${i + 1}@gradeline.test`, name: person(i * 7 + 1), role: "buyer" as const, passwordHash })),
  ];
  const created = await db.insert(users).values(newUsers).returning({ id: users.id, email: users.email, role: users.role });
  const otherAgents = [byEmail.get("agent2@gradeline.test")!, byEmail.get("agent3@gradeline.test")!, ...created.filter((u) => u.role === "agent").map((u) => u.id)];
  const buyers = created.filter((u) => u.role === "buyer");

  const existing = await db.$count(orders);
  const existingMine = await db.$count(orders, eq(orders.agentId, agentId));
  const count = BENCH_TOTALS.orders - existing;
  const mine = BENCH_TOTALS.measuredAgentOrders - existingMine;
  const existingReports = await db.$count(inspections);
  const reports = BENCH_TOTALS.reports - existingReports;

  const evaluations = {
    clay: evaluate(CLAY_LATERAL_1950S, { rates: DEMO_RATE_TABLE }),
    pvc: evaluate(PVC_LATERAL_1990S, { rates: DEMO_RATE_TABLE }),
  };

  const listingRows: (typeof listings.$inferInsert)[] = [];
  const orderRows: (typeof orders.$inferInsert)[] = [];
  const step = Math.floor(count / mine);
  let given = 0;
  for (let i = 0; i < count; i++) {
    const street = `${300 + i} ${STREETS[i % STREETS.length]} ${SUFFIXES[Math.floor(i / STREETS.length) % SUFFIXES.length]}`;
    const postalCode = POSTAL[i % POSTAL.length];
    const listingId = crypto.randomUUID();
    listingRows.push({ id: listingId, street, city: DEMO_TOWN.city, state: DEMO_TOWN.state, postalCode, addressKey: listingAddressKey({ street, postalCode }), propertyType: "single_family", yearBuilt: 1920 + Math.floor(rnd() * 80) });
    // Every step-th order is the measured agent's until they have their 200, so their table has every state.
    const measured = i % step === 0 && given < mine;
    if (measured) given++;
    const status = statusFor(i, reports, rnd);
    const live = status === "open" || status === "accepted" || status === "scheduled";
    const createdAt = new Date(now.getTime() - (live ? rnd() * 3 * DAY : (5 + rnd() * 170) * DAY));
    const deadline = new Date(createdAt.getTime() + (3 + rnd() * 9) * DAY);
    const inspectorId = status === "open" || status === "cancelled" ? null : byEmail.get(INSPECTORS[i % INSPECTORS.length])!;
    const visit = new Date(Math.min(deadline.getTime() - DAY, createdAt.getTime() + 2 * DAY));
    const appointment = status === "accepted" || status === "open" || status === "cancelled" ? null : { start: visit, end: new Date(visit.getTime() + 2 * HOUR) };
    const buyer = buyers[i % buyers.length];
    const rush = deadline.getTime() - createdAt.getTime() < 4 * DAY;
    const priceLines = [{ label: "Sewer scope", cents: 32500 }, ...(rush ? [{ label: "Rush (deadline under 48 hours)", cents: 9500 }] : [])];
    const priceCents = priceLines.reduce((s, l) => s + l.cents, 0);
    orderRows.push({
      id: crypto.randomUUID(),
      listingId,
      agentId: measured ? agentId : otherAgents[i % otherAgents.length],
      inspectorId,
      status,
      listingRef: i % 3 === 0 ? `HF-${10000 + i}` : null,
      occupancy: ["owner", "tenant", "vacant"][i % 3],
      accessNotes: "Lockbox on the side door; code from the listing agent.",
      cleanoutKnown: i % 4 !== 0,
      cleanoutNote: i % 4 !== 0 ? "Outside cleanout by the hose bib." : null,
      timeZone: DEMO_TOWN.timeZone,
      deadline,
      visitWindows: [{ start: new Date(createdAt.getTime() + DAY).toISOString(), end: new Date(createdAt.getTime() + DAY + 8 * HOUR).toISOString() }],
      buyerName: person(i),
      buyerEmail: status === "unlocked" ? buyer.email : `bench-buyer-${i}@example.test`,
      buyerId: status === "unlocked" ? buyer.id : null,
      priceCents,
      platformFeeCents: Math.round(priceCents * 0.2),
      priceLines,
      // Flagged already, so the at-risk sweeper sends no mail while the benchmarks run.
      atRiskNotifiedAt: live ? now : null,
      appointmentStart: appointment?.start ?? null,
      appointmentEnd: appointment?.end ?? null,
      acceptedAt: inspectorId ? new Date(createdAt.getTime() + 2 * HOUR) : null,
      deliveredAt: status === "delivered" || status === "unlocked" ? appointment!.end : null,
      unlockedAt: status === "unlocked" ? new Date(appointment!.end.getTime() + DAY) : null,
      cancelledAt: status === "cancelled" ? new Date(createdAt.getTime() + DAY) : null,
      createdAt,
    });
  }

  await db.transaction(async (tx) => {
    await insertChunked(listingRows, (c) => tx.insert(listings).values(c));
    await insertChunked(orderRows, (c) => tx.insert(orders).values(c));
    const events = orderRows.flatMap((o) =>
      PATHS[o.status!].map((to, k, path) => ({
        orderId: o.id!,
        fromStatus: k === 0 ? null : path[k - 1],
        toStatus: to,
        actorId: to === "open" || to === "cancelled" || to === "scheduled" ? o.agentId : to === "unlocked" ? o.buyerId! : o.inspectorId!,
        reason: to === "cancelled" ? "Buyer withdrew the offer." : null,
        at: new Date(o.createdAt!.getTime() + k * HOUR),
      })),
    );
    await insertChunked(events, (c) => tx.insert(orderEvents).values(c));
    const delivered = orderRows.filter((o) => o.status === "delivered" || o.status === "unlocked");
    await insertChunked(delivered, (c) =>
      tx.insert(inspections).values(
        c.map((o, k) => {
          const clay = k % 3 !== 0;
          return {
            orderId: o.id!,
            record: (clay ? CLAY_LATERAL_1950S : PVC_LATERAL_1990S) as unknown as Record<string, unknown>,
            narrative: clay ? "Clay lateral with roots at several joints and a sag mid-yard." : "PVC lateral in good shape; a thin grease film mid-run.",
            recommendation: clay ? "Cut the roots, re-scope, and get quotes for lining the clay section." : "No repair needed.",
            revision: 1,
            evaluation: (clay ? evaluations.clay : evaluations.pvc) as unknown as Record<string, unknown>,
            engineVersion: evaluations.clay.engineVersion,
            ratesId: "demo",
            submittedAt: o.deliveredAt,
          };
        }),
      ),
    );
    // Unlocked reports carry their paid payment and a payout already sent, so the ledger balances
    // (charge = transfer + fee) and the payout worker has nothing to do during the benchmarks.
    const unlocked = orderRows.filter((o) => o.status === "unlocked");
    const paymentRows = unlocked.map((o) => ({ id: crypto.randomUUID(), orderId: o.id!, buyerId: o.buyerId!, amountCents: o.priceCents, status: "paid" as const, checkoutSessionId: `cs_bench_${o.id}`, paidAt: o.unlockedAt }));
    await insertChunked(paymentRows, (c) => tx.insert(payments).values(c));
    await insertChunked(paymentRows, (c) => tx.insert(reportAccess).values(c.map((p) => ({ orderId: p.orderId, userId: p.buyerId, paymentId: p.id }))));
    const share = new Map(unlocked.map((o) => [o.id!, { inspectorId: o.inspectorId!, fee: o.platformFeeCents }]));
    await insertChunked(paymentRows, (c) =>
      tx.insert(payouts).values(c.map((p) => ({ paymentId: p.id, inspectorId: share.get(p.orderId)!.inspectorId, amountCents: p.amountCents - share.get(p.orderId)!.fee, status: "sent" as const, transferId: `tr_bench_${p.id}`, sentAt: p.paidAt }))),
    );
    const ledger = paymentRows.flatMap((p) => [
      { orderId: p.orderId, paymentId: p.id, kind: "charge" as const, amountCents: p.amountCents, externalId: p.checkoutSessionId },
      { orderId: p.orderId, paymentId: p.id, kind: "fee" as const, amountCents: share.get(p.orderId)!.fee, externalId: `fee-${p.checkoutSessionId}` },
      { orderId: p.orderId, paymentId: p.id, kind: "transfer" as const, amountCents: p.amountCents - share.get(p.orderId)!.fee, externalId: `tr_bench_${p.id}` },
    ]);
    await insertChunked(ledger, (c) => tx.insert(ledgerEntries).values(c));
  });
  return counted();
}
