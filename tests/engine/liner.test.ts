import { describe, expect, it } from "vitest";

import { linerWall, minStiffnessThickness, ovalityFactor, partlyDeterioratedThickness } from "../../lib/engine";
import { INSTALLED_WALL_SHARE, liningStandardFor, PSI_PER_FT_OF_WATER } from "../../lib/engine/liner";

describe("ASTM F1216 Appendix X1 (published)", () => {
  it.each([
    [0, 1.0],
    [2, 0.8358],
    [5, 0.6398],
    [10, 0.4115],
  ])("F1216 X1 ovality factor at %s %% is %s", (q, c) => {
    expect(ovalityFactor(q)).toBeCloseTo(c, 4);
  });

  it.each([
    [4, 0.0659],
    [6, 0.0988],
    [48, 0.79],
  ])("F1216 X1 minimum stiffness E/(12 DR^3) >= 0.093 psi, E = 250,000 psi: a %s-in pipe needs t >= %s in", (d, t) => {
    expect(minStiffnessThickness(d, 250_000)).toBeCloseTo(t, 3);
  });

  it("the minimum-stiffness wall does give 0.093 psi (derived: E / (12 (D/t)^3))", () => {
    const t = minStiffnessThickness(6, 250_000);
    expect(250_000 / (12 * Math.pow(6 / t, 3))).toBeCloseTo(0.093, 9);
  });

  it("Najafi, Trenchless Technology Piping (2010) worked example: D = 48 in, 12 ft of water (5.20 psi), E_L = 125,000 psi, q = 2 %: t = 0.878 in", () => {
    const groundwaterPsi = PSI_PER_FT_OF_WATER * 12;
    expect(groundwaterPsi).toBeCloseTo(5.2, 2);
    const t = partlyDeterioratedThickness({ diameterIn: 48, groundwaterPsi, longTermModulusPsi: 125_000, ovalityPct: 2 });
    expect(t).toBeCloseTo(0.878, 3);
  });

  it("a liner wall for a stretch is the thicker of the two checks, with groundwater at the surface (practice) and 87.5 % for the installed wall (practice)", () => {
    const shallow = linerWall(4, 3, 2);
    expect(shallow.designIn).toBe(Math.max(shallow.minStiffnessIn, shallow.partlyDeterioratedIn));
    expect(shallow.designIn).toBeCloseTo(0.0659, 4);
    const deep = linerWall(48, 12, 2);
    expect(deep.partlyDeterioratedIn).toBeCloseTo(0.878, 3);
    expect(deep.designIn).toBeCloseTo(0.878, 3);
    expect(deep.installedAtLeastIn).toBeCloseTo(0.878 * INSTALLED_WALL_SHARE, 3);
    expect(INSTALLED_WALL_SHARE).toBe(0.875);
  });

  it("more ovality means a thicker wall", () => {
    const round = partlyDeterioratedThickness({ diameterIn: 6, groundwaterPsi: 3, ovalityPct: 0 });
    const oval = partlyDeterioratedThickness({ diameterIn: 6, groundwaterPsi: 3, ovalityPct: 10 });
    expect(oval).toBeGreaterThan(round);
  });

  it("scopes (published): F2599 sectional 4-60 in, F2561 laterals 3-12 in up to 150 ft, F1216 4-108 in; nothing below 3 in", () => {
    expect(liningStandardFor(4, 8)).toContain("F2599");
    expect(liningStandardFor(3, 40)).toContain("F2561");
    expect(liningStandardFor(6, 140)).toContain("F2561");
    expect(liningStandardFor(6, 160)).toContain("F1216");
    expect(liningStandardFor(108, 300)).toContain("F1216");
    expect(liningStandardFor(2, 10)).toBeNull();
    expect(liningStandardFor(120, 300)).toBeNull();
  });
});
