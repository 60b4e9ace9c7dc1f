import { describe, expect, it } from "vitest";

import { fullFlowGpm, manningFlow, manningVelocity, partFullRatios } from "../../lib/engine";
import { CFS_TO_GPM, DESIGN_MANNING_N, MANNING_K_SI } from "../../lib/engine/flow";

const FULL = 1;

describe("Manning's equation (published: V = (k/n) R^(2/3) S^(1/2), k = 1.486 US, 1 SI)", () => {
  it("trade reference §4: a 4-in pipe full at 2 %, n = 0.013: V = 3.08 ft/s, Q = 0.269 cfs = 121 gpm", () => {
    const input = { diameter: 4 / 12, depthRatio: FULL, slope: 0.02, n: 0.013 };
    expect(manningVelocity(input)).toBeCloseTo(3.08, 2);
    expect(manningFlow(input)).toBeCloseTo(0.269, 3);
    expect(manningFlow(input) * CFS_TO_GPM).toBeCloseTo(121, 0);
  });

  it("trade reference §4, in SI: 100 mm full at 2 %, n = 0.013: V = 0.930 m/s, Q = 7.31 L/s", () => {
    const input = { diameter: 0.1, depthRatio: FULL, slope: 0.02, n: 0.013, k: MANNING_K_SI };
    expect(manningVelocity(input)).toBeCloseTo(0.93, 3);
    expect(manningFlow(input) * 1000).toBeCloseTo(7.31, 1);
  });

  it("4-in full, n = 0.010: 113 gpm at 1/8 in/ft and 160 gpm at 1/4 in/ft, within 2.5 % of the 115 and 163 gpm of IPC 2018 Table 1106.2 (published)", () => {
    const eighth = fullFlowGpm(4, 1 / 8 / 12, 0.01);
    const quarter = fullFlowGpm(4, 1 / 4 / 12, 0.01);
    expect(eighth).toBeCloseTo(113, 0);
    expect(quarter).toBeCloseTo(160, 0);
    expect(Math.abs(eighth - 115) / 115).toBeLessThan(0.025);
    expect(Math.abs(quarter - 163) / 163).toBeLessThan(0.025);
  });

  it("derived: doubling the slope multiplies the flow by sqrt 2", () => {
    expect(fullFlowGpm(6, 0.02, 0.013) / fullFlowGpm(6, 0.01, 0.013)).toBeCloseTo(Math.SQRT2, 12);
  });

  it("practice: design n is 0.013 for clay, concrete and cast iron and 0.010 for PVC (municipal tables after FHWA)", () => {
    expect(DESIGN_MANNING_N.vitrified_clay).toBe(0.013);
    expect(DESIGN_MANNING_N.concrete).toBe(0.013);
    expect(DESIGN_MANNING_N.cast_iron).toBe(0.013);
    expect(DESIGN_MANNING_N.pvc).toBe(0.01);
  });
});

describe("flow in a part-full pipe against half full (published: NSPC 2009 Appendix K)", () => {
  it.each([
    [0.25, 0.274, 0.701],
    [0.75, 1.82, 1.13],
    [1, 2.0, 1.0],
  ])("NSPC Appendix K: at d/D %s the pipe carries %s of the half-full flow at %s of its velocity", (r, q, v) => {
    const ratios = partFullRatios(r);
    expect(ratios.flow).toBeCloseTo(q, 2);
    expect(ratios.velocity).toBeCloseTo(v, 2);
  });
});
