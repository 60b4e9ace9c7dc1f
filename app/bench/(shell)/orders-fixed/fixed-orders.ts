import type { OrderListDto, OrderSummaryDto } from "@/lib/orders/dto";

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
const STATES = ["open", "accepted", "scheduled", "delivered", "unlocked", "cancelled"] as const;
const STREETS = ["Millrace Lane", "Tannery Row", "Ferrule Court", "Quarry Hill Road", "Kilnworks Lane", "Sluice Gate Way", "Lantern Street"];

/** A first page of 20 invented orders shaped like the seeded ones, built once in memory. */
export function fixedOrderList(now = Date.now()): OrderListDto {
  const orders: OrderSummaryDto[] = Array.from({ length: 20 }, (_, i) => {
    const status = STATES[i % STATES.length];
    const live = status === "open" || status === "accepted" || status === "scheduled";
    const createdAt = new Date(now - (live ? (i % 3) * DAY : (10 + i) * DAY));
    const deadline = new Date(createdAt.getTime() + (4 + (i % 6)) * DAY);
    const visit = new Date(deadline.getTime() - DAY);
    return {
      id: `00000000-0000-4000-8000-0000000001${10 + i}`,
      status,
      address: { street: `${300 + i * 10} ${STREETS[i % STREETS.length]}`, unit: null, city: "Harrow Falls", state: "OR", postalCode: `9799${i % 5}` },
      listingRef: i % 3 === 0 ? `HF-${10000 + i}` : null,
      deadline: deadline.toISOString(),
      timeZone: "America/Los_Angeles",
      priceCents: 32500,
      appointment: status === "scheduled" || status === "delivered" || status === "unlocked" ? { start: visit.toISOString(), end: new Date(visit.getTime() + 2 * HOUR).toISOString() } : null,
      atRisk: { flagged: false, reasons: [], text: [] },
      createdAt: createdAt.toISOString(),
      inspector: status === "open" || status === "cancelled" ? null : { id: `00000000-0000-4000-8000-0000000000${10 + i}`, name: "Theo Marsh" },
      buyerName: "Arlo Ashgrove",
    };
  });
  return { orders, total: 200, page: 1, pageSize: 20 };
}
