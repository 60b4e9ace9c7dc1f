import type { Prices } from "./pricing-defaults";

export const RUSH_HOURS = 48;

export type PriceLine = { label: string; cents: number };
export type Quote = { lines: PriceLine[]; priceCents: number; platformFeeCents: number; inspectorPayoutCents: number };

/** Fee in basis points, rounded to the cent; the inspector's payout is the rest, so the two always add up. */
export function splitFee(priceCents: number, feeBps: number): { platformFeeCents: number; inspectorPayoutCents: number } {
  const platformFeeCents = Math.round((priceCents * feeBps) / 10_000);
  return { platformFeeCents, inspectorPayoutCents: priceCents - platformFeeCents };
}

export function quoteScope(prices: Prices, input: { cleanoutKnown: boolean; buildingSewers: number; deadline: Date }, now = new Date()): Quote {
  const lines: PriceLine[] = [{ label: "Sewer scope", cents: prices.baseCents }];
  if (!input.cleanoutKnown) lines.push({ label: "No known cleanout (toilet pull or roof vent access)", cents: prices.noCleanoutCents });
  if (input.deadline.getTime() - now.getTime() < RUSH_HOURS * 3_600_000) lines.push({ label: `Rush (deadline under ${RUSH_HOURS} hours)`, cents: prices.rushCents });
  const extra = Math.max(0, input.buildingSewers - 1);
  if (extra > 0) lines.push({ label: `${extra} more building sewer${extra > 1 ? "s" : ""}`, cents: prices.extraSewerCents * extra });
  const priceCents = lines.reduce((sum, l) => sum + l.cents, 0);
  return { lines, priceCents, ...splitFee(priceCents, prices.platformFeeBps) };
}
