import fc from "fast-check";
import { describe, expect, it } from "vitest";

import { areaFilledPct, areaFraction, hydraulicRadiusRatio, wettedPerimeterRatio } from "../../lib/engine";

// derived: r = d/D, theta = 2 arccos(1 - 2r); A/(pi D^2/4) = (theta - sin theta)/(2 pi);
// P/D = theta/2; R/D = (1 - sin theta/theta)/4. Table from trade reference §3.
describe("a partly full circular pipe (derived, circular segment)", () => {
  it.each([
    [0.1, 0.052, 0.6435, 0.06352],
    [0.25, 0.1955, 1.0472, 0.14663],
    [0.5, 0.5, 1.5708, 0.25],
    [0.75, 0.8045, 2.0944, 0.30169],
  ])("at d/D = %s: area fraction %s, P/D %s, R/D %s", (r, area, p, rr) => {
    expect(areaFraction(r)).toBeCloseTo(area, 4);
    expect(wettedPerimeterRatio(r)).toBeCloseTo(p, 4);
    expect(hydraulicRadiusRatio(r)).toBeCloseTo(rr, 5);
  });

  it("trade reference §3: one inch of standing water in a 4-in pipe (r = 0.25) fills 19.6 % of the cross-section", () => {
    expect(areaFilledPct((1 / 4) * 100)).toBeCloseTo(19.6, 1);
  });

  it("is 0 for an empty pipe and 1 for a full one, where R/D = 1/4 and P/D = pi", () => {
    expect(areaFraction(0)).toBe(0);
    expect(hydraulicRadiusRatio(0)).toBe(0);
    expect(areaFraction(1)).toBeCloseTo(1, 12);
    expect(hydraulicRadiusRatio(1)).toBeCloseTo(0.25, 12);
    expect(wettedPerimeterRatio(1)).toBeCloseTo(Math.PI, 12);
  });

  it("property: the area filled grows with the water depth", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 100, noNaN: true }), fc.double({ min: 0, max: 100, noNaN: true }), (a, b) => {
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        expect(areaFilledPct(lo)).toBeLessThanOrEqual(areaFilledPct(hi) + 1e-12);
        if (hi - lo > 1e-6) expect(areaFilledPct(lo)).toBeLessThan(areaFilledPct(hi));
      }),
    );
  });

  it("property: the area filled is symmetric about half full (A(r) + A(1 - r) = 1)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1, noNaN: true }), (r) => {
        expect(areaFraction(r) + areaFraction(1 - r)).toBeCloseTo(1, 9);
      }),
    );
  });
});
