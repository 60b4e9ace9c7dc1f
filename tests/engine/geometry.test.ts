import { describe, expect, it } from "vitest";

import { evaluate } from "../../lib/engine";
import { plainLine } from "./fixtures/records";

const twoMaterials = {
  segments: [
    { from: 0, to: 12, material: "cast_iron" as const, diameterIn: 4 },
    { from: 12, to: 50, material: "vitrified_clay" as const, diameterIn: 6 },
    { from: 50, to: 60, material: "pvc" as const, diameterIn: 6 },
  ],
};

describe("line geometry", () => {
  it("splits the surveyed length at the boundary", () => {
    const { lengths } = evaluate(plainLine(twoMaterials));
    expect(lengths).toMatchObject({ surveyed: 60, private: 45, public: 15, boundaryAt: 45, boundaryBeyondSurvey: false });
  });

  it("with no boundary all of it is private", () => {
    const { lengths } = evaluate(plainLine({ boundaryAt: null }));
    expect(lengths).toMatchObject({ surveyed: 60, private: 60, public: 0 });
  });

  it("a boundary past the end of the survey leaves nothing public", () => {
    const { lengths } = evaluate(plainLine({ boundaryAt: 75 }));
    expect(lengths).toMatchObject({ private: 60, public: 0, boundaryBeyondSurvey: true });
  });

  it("gives the length of each material, split by side", () => {
    const { lengths } = evaluate(plainLine(twoMaterials));
    expect(lengths.byMaterial.map((m) => [m.material, m.length, m.private, m.public])).toEqual([
      ["cast_iron", 12, 12, 0],
      ["vitrified_clay", 38, 33, 5],
      ["pvc", 10, 0, 10],
    ]);
    expect(lengths.segments.map((s) => s.lengthFt)).toEqual([12, 38, 10]);
  });
});
