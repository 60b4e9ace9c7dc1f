import "server-only";

import { and, count, eq, gte, isNotNull, isNull, lt, sql } from "drizzle-orm";

import { DEFAULT_TIME_ZONE, zonedLocalToIso } from "@/lib/time-zones";

import { getDb } from "../client";
import { disputes, inspectorProfiles, ledgerEntries, users } from "../schema";

export type MonthMoney = {
  /** First day of the month, YYYY-MM-DD, in the market's time zone. */
  month: string;
  chargedCents: number;
  refundedCents: number;
  /** Charges less refunds. */
  revenueCents: number;
  /** Platform fees kept, net of fees given back with refunds. */
  feesCents: number;
};

/** The calendar month around `now` in a time zone, as two instants. */
export function monthBounds(now: Date, timeZone: string): { month: string; start: Date; end: Date } {
  const [y, m] = new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit" }).format(now).split("-").map(Number);
  const first = `${y}-${String(m).padStart(2, "0")}-01`;
  const next = m === 12 ? `${y + 1}-01-01` : `${y}-${String(m + 1).padStart(2, "0")}-01`;
  return {
    month: first,
    start: new Date(zonedLocalToIso(first, "00:00", timeZone)!),
    end: new Date(zonedLocalToIso(next, "00:00", timeZone)!),
  };
}

/** Money in the ledger this calendar month: charges, refunds and platform fees, in cents. */
export async function moneyThisMonth(now = new Date(), timeZone = DEFAULT_TIME_ZONE): Promise<MonthMoney> {
  const db = await getDb();
  const { month, start, end } = monthBounds(now, timeZone);
  const rows = await db
    .select({ kind: ledgerEntries.kind, total: sql<number>`coalesce(sum(${ledgerEntries.amountCents}), 0)::int` })
    .from(ledgerEntries)
    .where(and(gte(ledgerEntries.createdAt, start), lt(ledgerEntries.createdAt, end)))
    .groupBy(ledgerEntries.kind);
  const sum = (kind: string) => Number(rows.find((r) => r.kind === kind)?.total ?? 0);
  const chargedCents = sum("charge");
  const refundedCents = sum("refund");
  return { month, chargedCents, refundedCents, revenueCents: chargedCents - refundedCents, feesCents: sum("fee") };
}

/** The verification queue's length: enabled inspectors without verification who have a licence on file. */
export async function countVerificationQueue(): Promise<number> {
  const db = await getDb();
  const [row] = await db
    .select({ n: count() })
    .from(inspectorProfiles)
    .innerJoin(users, eq(users.id, inspectorProfiles.userId))
    .where(
      and(
        eq(users.role, "inspector"),
        isNull(users.disabledAt),
        isNull(inspectorProfiles.verifiedAt),
        isNotNull(inspectorProfiles.licenceNumber),
      ),
    );
  return Number(row?.n ?? 0);
}

export async function countOpenDisputes(): Promise<number> {
  const db = await getDb();
  const [row] = await db.select({ n: count() }).from(disputes).where(eq(disputes.status, "open"));
  return Number(row?.n ?? 0);
}
