import "server-only";

import { eq } from "drizzle-orm";

import { hashPassword } from "@/lib/auth/password";
import { DEMO_TOWN, DEMO_USERS, demoOrders } from "@/lib/demo-world";
import { DEFAULT_PRICES } from "@/lib/pricing-defaults";

import { getDb } from "./client";
import { listingAddressKey } from "./queries/order-commands";
import { DEFAULT_MARKET } from "./queries/prices";
import { inspectorProfiles, listings, orderEvents, orders, priceSettings, serviceAreas, users, type OrderStatus } from "./schema";
import { seedDemoReports } from "./seed-reports";

export const DEMO_PASSWORD = "gradeline-demo";

export const PATHS: Record<OrderStatus, OrderStatus[]> = {
  open: ["open"],
  accepted: ["open", "accepted"],
  scheduled: ["open", "accepted", "scheduled"],
  delivered: ["open", "accepted", "scheduled", "delivered"],
  unlocked: ["open", "accepted", "scheduled", "delivered", "unlocked"],
  cancelled: ["open", "cancelled"],
  refunded: ["open", "accepted", "scheduled", "delivered", "unlocked", "refunded"],
};

const HOUR = 3_600_000;
const DAY = 24 * HOUR;

/** When each step of a demo order happened: an hour apart at first, delivery at the visit's end, a day between later steps, never after now. */
function stepTimes(o: { status: OrderStatus; createdAt: Date; appointment?: { end: Date } }, now: Date): Map<OrderStatus, Date> {
  const created = o.createdAt.getTime();
  const delivered = o.appointment?.end.getTime() ?? created + 3 * HOUR;
  const at: Record<OrderStatus, number> = {
    open: created,
    accepted: created + HOUR,
    scheduled: created + 2 * HOUR,
    delivered,
    unlocked: delivered + DAY,
    refunded: delivered + 2 * DAY,
    cancelled: created + DAY,
  };
  return new Map(PATHS[o.status].map((step) => [step, new Date(Math.min(at[step], now.getTime()))]));
}

/** Seeds the invented demo world once; running it again changes nothing. */
export async function seedDemoWorld(now = new Date()): Promise<{ seeded: boolean }> {
  const db = await getDb();
  const [existing] = await db.select({ id: users.id }).from(users).where(eq(users.email, "admin@gradeline.test")).limit(1);
  if (existing) {
    await seedDemoReports();
    return { seeded: false };
  }
  const passwordHash = await hashPassword(DEMO_PASSWORD);

  await db.transaction(async (tx) => {
    const ids = new Map<string, string>();
    for (const u of DEMO_USERS) {
      const [row] = await tx
        .insert(users)
        .values({ email: u.email, name: u.name, role: u.role, company: u.company ?? null, phone: u.phone ?? null, passwordHash })
        .returning({ id: users.id });
      ids.set(u.email, row.id);
      if (u.role === "inspector" && u.inspector) {
        await tx.insert(inspectorProfiles).values({
          userId: row.id,
          licenceNumber: u.inspector.licence,
          licenceExpiresOn: u.inspector.licenceExpiresOn,
          baseLocation: u.inspector.base,
          availability: {
            mon: [{ start: "08:00", end: "17:00" }],
            tue: [{ start: "08:00", end: "17:00" }],
            wed: [{ start: "08:00", end: "17:00" }],
            thu: [{ start: "08:00", end: "17:00" }],
            fri: [{ start: "08:00", end: "15:00" }],
          },
          verifiedAt: u.inspector.verified ? now : null,
        });
        for (const postalCode of u.inspector.postalCodes) await tx.insert(serviceAreas).values({ inspectorId: row.id, postalCode });
      }
    }
    const admin = ids.get("admin@gradeline.test")!;
    await tx
      .insert(priceSettings)
      .values({ market: DEFAULT_MARKET, ...DEFAULT_PRICES, sourceNote: "Demo market opening prices (invented).", createdBy: admin });

    for (const o of demoOrders(now)) {
      const [listing] = await tx
        .insert(listings)
        .values({
          street: o.street,
          city: DEMO_TOWN.city,
          state: DEMO_TOWN.state,
          postalCode: o.postalCode,
          addressKey: listingAddressKey({ street: o.street, postalCode: o.postalCode }),
          propertyType: o.propertyType,
          yearBuilt: o.yearBuilt,
        })
        .returning({ id: listings.id });
      const agentId = ids.get(o.agent)!;
      const inspectorId = o.inspector ? ids.get(o.inspector)! : null;
      const times = stepTimes(o, now);
      const [order] = await tx
        .insert(orders)
        .values({
          listingId: listing.id,
          agentId,
          inspectorId,
          status: o.status,
          occupancy: o.occupancy,
          accessNotes: o.accessNotes,
          cleanoutKnown: o.cleanoutKnown,
          cleanoutNote: o.cleanoutNote ?? null,
          timeZone: DEMO_TOWN.timeZone,
          deadline: o.deadline,
          visitWindows: o.visitWindows,
          anyTimeInWindows: false,
          buyerName: o.buyer.name,
          buyerEmail: o.buyer.email,
          buyerId: ids.get(o.buyer.email) ?? null,
          priceCents: o.priceCents,
          platformFeeCents: Math.round(o.priceCents * 0.2),
          priceLines: o.priceLines,
          appointmentStart: o.appointment?.start ?? null,
          appointmentEnd: o.appointment?.end ?? null,
          acceptedAt: times.get("accepted") ?? null,
          deliveredAt: times.get("delivered") ?? null,
          unlockedAt: times.get("unlocked") ?? null,
          cancelledAt: times.get("cancelled") ?? null,
          createdAt: o.createdAt,
        })
        .returning({ id: orders.id });
      const path = PATHS[o.status];
      for (let i = 0; i < path.length; i++) {
        const to = path[i];
        const actor =
          to === "open" || to === "cancelled" || to === "scheduled"
            ? agentId
            : to === "unlocked"
              ? (ids.get(o.buyer.email) ?? null)
              : to === "refunded"
                ? admin
                : inspectorId;
        await tx.insert(orderEvents).values({
          orderId: order.id,
          fromStatus: i === 0 ? null : path[i - 1],
          toStatus: to,
          actorId: actor,
          reason: to === "cancelled" ? "Buyer withdrew the offer." : to === "refunded" ? "Duplicate payment by the buyer (demo)." : null,
          at: times.get(to)!,
        });
      }
    }
  });
  await seedDemoReports();
  return { seeded: true };
}
