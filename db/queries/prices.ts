import "server-only";

import { desc, eq } from "drizzle-orm";

import { DEFAULT_PRICES, type Prices } from "@/lib/pricing-defaults";

import { getDb, type Tx } from "../client";
import { priceSettings } from "../schema";

export const DEFAULT_MARKET = "harrow-falls";

/** The market's current prices: the newest settings row, or the demo defaults before any is saved. */
export async function currentPrices(market = DEFAULT_MARKET, tx?: Tx): Promise<Prices & { id: string | null }> {
  const db = tx ?? (await getDb());
  const [row] = await db.select().from(priceSettings).where(eq(priceSettings.market, market)).orderBy(desc(priceSettings.effectiveAt)).limit(1);
  if (!row) return { ...DEFAULT_PRICES, id: null };
  return {
    id: row.id,
    baseCents: row.baseCents,
    noCleanoutCents: row.noCleanoutCents,
    rushCents: row.rushCents,
    extraSewerCents: row.extraSewerCents,
    reuseCents: row.reuseCents,
    platformFeeBps: row.platformFeeBps,
    reuseInspectorShareBps: row.reuseInspectorShareBps,
    reuseFreshDays: row.reuseFreshDays,
  };
}
