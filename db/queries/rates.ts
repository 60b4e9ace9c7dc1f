import "server-only";

import { desc, eq } from "drizzle-orm";

import { DEMO_RATE_TABLE, RateTableSchema, type RateTable } from "@/lib/engine";

import { getDb } from "../client";
import { rateTables } from "../schema";
import { DEFAULT_MARKET } from "./prices";

/** The newest saved rate table of the market, or the engine's demo table before an admin saves one. */
export async function currentRates(market = DEFAULT_MARKET): Promise<{ id: string; table: RateTable }> {
  const db = await getDb();
  const [row] = await db.select().from(rateTables).where(eq(rateTables.market, market)).orderBy(desc(rateTables.effectiveAt)).limit(1);
  if (!row) return { id: "demo", table: DEMO_RATE_TABLE };
  return { id: row.id, table: RateTableSchema.parse(row.table) };
}
