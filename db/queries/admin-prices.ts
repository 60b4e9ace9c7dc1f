import "server-only";

import { desc, eq } from "drizzle-orm";

import { RateTableSchema, type RateTable } from "@/lib/engine/rates";
import type { Prices } from "@/lib/pricing-defaults";

import { getDb } from "../client";
import { priceSettings, rateTables, users } from "../schema";
import { recordAudit } from "./audit";
import { currentPrices, DEFAULT_MARKET } from "./prices";
import { currentRates } from "./rates";

type Actor = { id: string; ip: string };

export type PriceVersionDto = Prices & { id: string; effectiveAt: string; sourceNote: string | null; by: string | null };
export type RateVersionDto = {
  id: string;
  name: string;
  effectiveDate: string;
  effectiveAt: string;
  sourceNote: string | null;
  by: string | null;
  demo: boolean;
};

const HISTORY_LIMIT = 50;

export async function listPriceHistory(market = DEFAULT_MARKET): Promise<PriceVersionDto[]> {
  const db = await getDb();
  const rows = await db
    .select({ p: priceSettings, by: users.name })
    .from(priceSettings)
    .leftJoin(users, eq(users.id, priceSettings.createdBy))
    .where(eq(priceSettings.market, market))
    .orderBy(desc(priceSettings.effectiveAt), desc(priceSettings.id))
    .limit(HISTORY_LIMIT);
  return rows.map(({ p, by }) => ({
    id: p.id,
    baseCents: p.baseCents,
    noCleanoutCents: p.noCleanoutCents,
    rushCents: p.rushCents,
    extraSewerCents: p.extraSewerCents,
    reuseCents: p.reuseCents,
    platformFeeBps: p.platformFeeBps,
    reuseInspectorShareBps: p.reuseInspectorShareBps,
    reuseFreshDays: p.reuseFreshDays,
    effectiveAt: p.effectiveAt.toISOString(),
    sourceNote: p.sourceNote,
    by,
  }));
}

/** Current prices and their history, newest first. */
export async function pricesOverview(
  market = DEFAULT_MARKET,
): Promise<{ current: Prices & { id: string | null }; history: PriceVersionDto[] }> {
  const [current, history] = await Promise.all([currentPrices(market), listPriceHistory(market)]);
  return { current, history };
}

/** Saves prices as a new row (never an update), with its audit row in the same transaction. */
export async function insertPriceVersion(
  input: Prices & { sourceNote: string | null },
  actor: Actor,
  market = DEFAULT_MARKET,
): Promise<string> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const before = await currentPrices(market, tx);
    const [row] = await tx
      .insert(priceSettings)
      .values({ market, ...input, createdBy: actor.id, effectiveAt: new Date() })
      .returning({ id: priceSettings.id });
    const { id: previousId, ...previous } = before;
    await recordAudit(
      {
        actorId: actor.id,
        action: "admin.prices_changed",
        targetType: "price_settings",
        targetId: row.id,
        ip: actor.ip,
        data: { market, previousId, previous, next: input },
      },
      tx,
    );
    return row.id;
  });
}

export async function listRateHistory(market = DEFAULT_MARKET): Promise<RateVersionDto[]> {
  const db = await getDb();
  const rows = await db
    .select({ r: rateTables, by: users.name })
    .from(rateTables)
    .leftJoin(users, eq(users.id, rateTables.createdBy))
    .where(eq(rateTables.market, market))
    .orderBy(desc(rateTables.effectiveAt), desc(rateTables.id))
    .limit(HISTORY_LIMIT);
  return rows.map(({ r, by }) => {
    const parsed = RateTableSchema.safeParse(r.table);
    return {
      id: r.id,
      name: parsed.success ? parsed.data.name : "Unreadable table",
      effectiveDate: parsed.success ? parsed.data.effectiveDate : "",
      demo: parsed.success ? parsed.data.demo : false,
      effectiveAt: r.effectiveAt.toISOString(),
      sourceNote: r.sourceNote,
      by,
    };
  });
}

/** The rate table in force (the engine's demo table until an admin saves one) and its history. */
export async function ratesOverview(
  market = DEFAULT_MARKET,
): Promise<{ current: { id: string; table: RateTable }; history: RateVersionDto[] }> {
  const [current, history] = await Promise.all([currentRates(market), listRateHistory(market)]);
  return { current, history };
}

/** Saves a rate table as a new row; reports already computed keep the id of the one they used. */
export async function insertRateVersion(
  table: RateTable,
  sourceNote: string | null,
  actor: Actor,
  market = DEFAULT_MARKET,
): Promise<string> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [previous] = await tx
      .select({ id: rateTables.id })
      .from(rateTables)
      .where(eq(rateTables.market, market))
      .orderBy(desc(rateTables.effectiveAt), desc(rateTables.id))
      .limit(1);
    const [row] = await tx
      .insert(rateTables)
      .values({ market, table, sourceNote, createdBy: actor.id, effectiveAt: new Date() })
      .returning({ id: rateTables.id });
    await recordAudit(
      {
        actorId: actor.id,
        action: "admin.rates_changed",
        targetType: "rate_table",
        targetId: row.id,
        ip: actor.ip,
        data: { market, previousId: previous?.id ?? "demo", name: table.name, effectiveDate: table.effectiveDate, sourceNote },
      },
      tx,
    );
    return row.id;
  });
}
