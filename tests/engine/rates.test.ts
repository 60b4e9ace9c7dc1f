import { describe, expect, it } from "vitest";

import { DEMO_RATE_TABLE, evaluate, RateTableSchema, type RateTable } from "../../lib/engine";
import { withFindings } from "./fixtures/records";

describe("the rate table", () => {
  it("the demo table passes its own schema and says it is demo data, with a date and a source", () => {
    expect(RateTableSchema.safeParse(DEMO_RATE_TABLE).success).toBe(true);
    expect(DEMO_RATE_TABLE.demo).toBe(true);
    expect(DEMO_RATE_TABLE.effectiveDate).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    expect(DEMO_RATE_TABLE.source).toMatch(/[Dd]emo/);
  });

  it("refuses a low figure above the high one, fractional cents and depth bands that do not start at 0", () => {
    const bad = structuredClone(DEMO_RATE_TABLE) as RateTable;
    bad.methods.lining.fixed = { lowCents: 500_000, highCents: 100_000 };
    bad.transitionLiner.lowCents = 10.5;
    bad.depthBands[0].fromFt = 1;
    const r = RateTableSchema.safeParse(bad);
    expect(r.success).toBe(false);
    expect(r.error?.issues.map((i) => i.path.join("."))).toEqual([
      "methods.lining.fixed.highCents",
      "transitionLiner.lowCents",
      "depthBands",
    ]);
  });

  // Sanity bounds only (trade reference §7, municipal guidance pages, California, read 2026):
  // a 35-40 ft lateral by open trench about $4,000-$15,000, trenchless $3,000-$11,000.
  describe("demo rates sit inside the municipal sanity bounds for a 38 ft lateral in a lawn", () => {
    const whole = withFindings([{ at: 2, to: 36, type: "fracture", grade: 4 }], {
      segments: [{ from: 0, to: 38, material: "vitrified_clay", diameterIn: 4 }],
      surveyEnd: { at: 38, reason: "reached_main" },
      boundaryAt: null,
      locates: [0, 19, 38].map((at) => ({ at, depthFt: 3, groundElevationFt: null, surface: "soil" as const })),
    });
    const s = evaluate(whole).stretches[0];
    const cost = (m: string) => {
      const o = s.options.find((x) => x.method === m);
      return [(o?.costLowCents ?? NaN) / 100, (o?.costHighCents ?? NaN) / 100];
    };

    it("the stretch is the whole 38 ft", () => {
      expect([s.from, s.to]).toEqual([0, 38]);
    });

    it("open trench (excavate and replace) within $4,000-$15,000", () => {
      const [low, high] = cost("excavate_replace");
      expect(low).toBeGreaterThanOrEqual(4_000);
      expect(high).toBeLessThanOrEqual(15_000);
    });

    it.each(["lining", "pipe_bursting"])("trenchless (%s) within $3,000-$11,000", (m) => {
      const [low, high] = cost(m);
      expect(low).toBeGreaterThanOrEqual(3_000);
      expect(high).toBeLessThanOrEqual(11_000);
    });
  });
});
