// Invented demo values for the demo market (Harrow Falls). Admins set the live prices per market;
// these are only the starting point and what the public pricing page shows. Money in integer cents,
// shares in basis points (10000 = 100 %), the reuse freshness in whole days after the visit.
export const DEFAULT_PRICES = {
  baseCents: 32500,
  noCleanoutCents: 7500,
  rushCents: 9500,
  extraSewerCents: 15000,
  reuseCents: 14500,
  platformFeeBps: 2000,
  reuseInspectorShareBps: 5000,
  reuseFreshDays: 180,
} as const;

export type Prices = { [K in keyof typeof DEFAULT_PRICES]: number };

/** A report can be sold again to a later buyer of the same listing for this long after the visit (admin setting). */
export const DEFAULT_REUSE_FRESH_DAYS = DEFAULT_PRICES.reuseFreshDays;
