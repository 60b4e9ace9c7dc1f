import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { GET as getPrices, POST as savePrices } from "@/app/api/admin/prices/route";
import { GET as getRates, POST as saveRates } from "@/app/api/admin/rates/route";
import { POST as quote } from "@/app/api/orders/quote/route";
import { POST as createOrder } from "@/app/api/orders/route";
import { getDb } from "@/db/client";
import { currentPrices } from "@/db/queries/prices";
import { currentRates } from "@/db/queries/rates";
import { auditLog, inspections, orders, priceSettings, rateTables } from "@/db/schema";
import { DEMO_RATE_TABLE, type RateTable } from "@/lib/engine/rates";
import { DEFAULT_PRICES } from "@/lib/pricing-defaults";

import { call } from "../utils/session";
import { deliveredReport, orderInput, signedIn, verifiedInspector } from "../utils/world";

const quoteBody = () => ({
  postalCode: "97991",
  cleanoutKnown: true,
  buildingSewers: 1,
  deadline: new Date(Date.now() + 7 * 86_400_000).toISOString(),
});
const clone = <T>(v: T): T => JSON.parse(JSON.stringify(v)) as T;

async function counts() {
  const db = await getDb();
  return Promise.all([db.$count(priceSettings), db.$count(rateTables), db.$count(auditLog)]);
}

describe("prices", async () => {
  const admin = await signedIn("admin");
  const agent = await signedIn("agent");
  await verifiedInspector(["97991"]);
  const post = (body: unknown) => call(savePrices, { method: "POST", body, cookie: admin.cookie });

  it("a price change is a new row that new quotes use, while an existing order keeps its price lines", async () => {
    const before = await call(createOrder, { method: "POST", body: orderInput(), cookie: agent.cookie });
    expect(before.status, JSON.stringify(before.json)).toBe(201);
    const db = await getDb();
    const [old] = await db
      .select()
      .from(orders)
      .where(eq(orders.id, before.json.id as string));
    expect(old.priceLines).toEqual([{ label: "Sewer scope", cents: DEFAULT_PRICES.baseCents }]);

    const res = await post({ ...DEFAULT_PRICES, baseCents: 41000, platformFeeBps: 2250, sourceNote: "Spring fuel surcharge" });
    expect(res.status).toBe(200);
    expect(res.json.current).toMatchObject({ baseCents: 41000, platformFeeBps: 2250 });
    const history = res.json.history as { baseCents: number; by: string; sourceNote: string | null; effectiveAt: string }[];
    expect(history[0]).toMatchObject({ baseCents: 41000, by: admin.user.name, sourceNote: "Spring fuel surcharge" });

    const q = await call(quote, { method: "POST", body: quoteBody(), cookie: agent.cookie });
    expect(q.json).toMatchObject({ priceCents: 41000, inspectorPayoutCents: 41000 - Math.round(41000 * 0.225) });

    const [kept] = await db.select().from(orders).where(eq(orders.id, old.id));
    expect(kept.priceLines).toEqual(old.priceLines);
    expect(kept.priceCents).toBe(old.priceCents);

    const again = await post({ ...DEFAULT_PRICES, baseCents: 39900 });
    expect(again.status).toBe(200);
    expect(await db.$count(priceSettings)).toBe(2);
    expect((await currentPrices()).baseCents).toBe(39900);
    const [entry] = await db.select().from(auditLog).where(eq(auditLog.action, "admin.prices_changed")).limit(1);
    expect(entry.actorId).toBe(admin.user.id);
    expect((await call(getPrices, { cookie: admin.cookie })).json.history).toHaveLength(2);
  });

  it("refuses negative prices, a fee over 100 % and fractional cents with field errors, and writes nothing", async () => {
    const before = await counts();
    const res = await post({ ...DEFAULT_PRICES, baseCents: -100, rushCents: 10.5, platformFeeBps: 10_001, reuseInspectorShareBps: -1 });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error?.fieldErrors ?? {}).sort()).toEqual([
      "baseCents",
      "platformFeeBps",
      "reuseInspectorShareBps",
      "rushCents",
    ]);
    expect(res.json.error?.fieldErrors?.platformFeeBps).toEqual(["Cannot be over 100 %."]);
    expect((await post({ baseCents: 30000 })).status).toBe(400);
    expect(await counts()).toEqual(before);
  });

  it("saves the reuse freshness in days with the dated prices, and refuses zero, fractions and over two years", async () => {
    for (const [reuseFreshDays, message] of [
      [0, "At least 1 day."],
      [12.5, "Use whole days."],
      [731, "At most 730 days: a report over two years old says little about the line today."],
    ] as const) {
      const before = await counts();
      const bad = await post({ ...DEFAULT_PRICES, reuseFreshDays });
      expect(bad.status).toBe(400);
      expect(bad.json.error?.fieldErrors).toEqual({ reuseFreshDays: [message] });
      expect(await counts()).toEqual(before);
    }
    const { reuseFreshDays: _omitted, ...withoutDays } = DEFAULT_PRICES;
    expect((await post(withoutDays)).json.error?.fieldErrors).toHaveProperty("reuseFreshDays");

    const res = await post({ ...DEFAULT_PRICES, reuseFreshDays: 365, sourceNote: "A year is fresh enough here" });
    expect(res.status).toBe(200);
    expect(res.json.current).toMatchObject({ reuseFreshDays: 365 });
    expect((res.json.history as { reuseFreshDays: number }[])[0].reuseFreshDays).toBe(365);
    expect((await currentPrices()).reuseFreshDays).toBe(365);
    const db = await getDb();
    const [entry] = await db
      .select()
      .from(auditLog)
      .where(eq(auditLog.targetId, (res.json.current as { id: string }).id));
    expect(entry.data).toMatchObject({ next: { reuseFreshDays: 365 }, previous: { reuseFreshDays: expect.any(Number) } });
  });
});

describe("the repair-cost rate table", async () => {
  const admin = await signedIn("admin");
  const post = (body: unknown) => call(saveRates, { method: "POST", body, cookie: admin.cookie });

  it("a rate change is a new row that currentRates() returns, while a delivered report keeps the rates it was computed with", async () => {
    const report = await deliveredReport();
    const db = await getDb();
    const [inspection] = await db.select().from(inspections).where(eq(inspections.orderId, report.id));
    const oldRatesId = inspection.ratesId;
    expect(oldRatesId).toBe((await currentRates()).id);

    const table: RateTable = clone(DEMO_RATE_TABLE);
    table.name = "Harrow Falls contractors, spring survey";
    table.demo = false;
    table.effectiveDate = "2026-04-01";
    table.methods.lining.perFoot = { lowCents: 9_000, highCents: 21_000 };
    const res = await post({ table, sourceNote: "Three bids from local lining crews" });
    expect(res.status).toBe(200);
    const current = await currentRates();
    expect(current.id).not.toBe(oldRatesId);
    expect(current.table.methods.lining.perFoot).toEqual({ lowCents: 9_000, highCents: 21_000 });
    expect(res.json.current).toMatchObject({ id: current.id });
    expect((res.json.history as { id: string; name: string; by: string }[])[0]).toMatchObject({
      id: current.id,
      name: table.name,
      by: admin.user.name,
    });

    const second = clone(table);
    second.methods.lining.fixed = { lowCents: 200_000, highCents: 350_000 };
    expect((await post({ table: second })).status).toBe(200);
    expect(await db.$count(rateTables)).toBe(2);
    const [first] = await db.select().from(rateTables).where(eq(rateTables.id, current.id));
    expect((first.table as RateTable).methods.lining.fixed).toEqual(DEMO_RATE_TABLE.methods.lining.fixed);

    const [kept] = await db.select().from(inspections).where(eq(inspections.orderId, report.id));
    expect(kept.ratesId).toBe(oldRatesId);
    expect(kept.evaluation).toEqual(inspection.evaluation);
    expect((await call(getRates, { cookie: admin.cookie })).json.history).toHaveLength(2);
  });

  it("refuses a malformed rate table with field errors by path, and writes nothing", async () => {
    const before = await counts();
    const table = clone(DEMO_RATE_TABLE) as unknown as Record<string, unknown> & {
      methods: Record<string, Record<string, unknown>>;
      depthBands: unknown[];
    };
    table.methods.lining.perFoot = { lowCents: 20_000, highCents: 9_000 };
    table.methods.spot_repair.fixed = { lowCents: -5, highCents: 100 };
    table.depthBands = [{ fromFt: 2, excavation: 1, trenchless: 1 }];
    delete table.surfaces;
    const res = await post({ table });
    expect(res.status).toBe(400);
    const fields = Object.keys(res.json.error?.fieldErrors ?? {}).sort();
    expect(fields).toEqual([
      "table.depthBands",
      "table.methods.lining.perFoot.highCents",
      "table.methods.spot_repair.fixed.lowCents",
      "table.surfaces",
    ]);
    expect((await post({ table: "not a table" })).status).toBe(400);
    expect((await post({ table: DEMO_RATE_TABLE, extra: 1 })).status).toBe(400);
    expect(await counts()).toEqual(before);
  });
});
