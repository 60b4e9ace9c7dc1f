import { describe, expect, it } from "vitest";

import { DEFAULT_PRICES } from "@/lib/pricing-defaults";
import { quoteScope, splitFee } from "@/lib/pricing";

const now = new Date("2026-12-02T12:00:00Z");
const inDays = (d: number) => new Date(now.getTime() + d * 86_400_000);

describe("pricing a scope (integer cents)", () => {
  it("charges the base price alone for a known cleanout, one sewer and a week's notice", () => {
    const q = quoteScope(DEFAULT_PRICES, { cleanoutKnown: true, buildingSewers: 1, deadline: inDays(7) }, now);
    expect(q.lines).toEqual([{ label: "Sewer scope", cents: 32500 }]);
    expect(q.priceCents).toBe(32500);
  });

  it("adds rush only under 48 hours", () => {
    expect(quoteScope(DEFAULT_PRICES, { cleanoutKnown: true, buildingSewers: 1, deadline: inDays(2) }, now).priceCents).toBe(32500);
    expect(quoteScope(DEFAULT_PRICES, { cleanoutKnown: true, buildingSewers: 1, deadline: inDays(1.99) }, now).priceCents).toBe(32500 + 9500);
  });

  it("adds each extra building sewer and the no-cleanout access", () => {
    const q = quoteScope(DEFAULT_PRICES, { cleanoutKnown: false, buildingSewers: 3, deadline: inDays(5) }, now);
    expect(q.priceCents).toBe(32500 + 7500 + 2 * 15000);
  });

  it("splits fee and payout so they always add up to the price", () => {
    for (const price of [1, 3, 32500, 33333, 99999]) {
      const s = splitFee(price, 2000);
      expect(s.platformFeeCents + s.inspectorPayoutCents).toBe(price);
    }
    expect(splitFee(32500, 2000)).toEqual({ platformFeeCents: 6500, inspectorPayoutCents: 26000 });
  });
});
