import { describe, expect, it } from "vitest";

import { evaluate, gradeBetween, IPC_704_1, minimumSlope, sondeDepthFromNulls, UPC_708_1, type SlopeRuleSet } from "../../lib/engine";
import { fractionText, inPerFt } from "../../lib/engine/slope-rules";
import { plainLine } from "./fixtures/records";

const mark = (at: number, depthFt: number, groundElevationFt: number | null = null) => ({
  at,
  depthFt,
  groundElevationFt,
  surface: "soil" as const,
});

describe("minimum slope, International Plumbing Code Table 704.1 (published)", () => {
  it.each([
    [2, "1/4", 2.0833],
    [2.5, "1/4", 2.0833],
    [3, "1/8", 1.0417],
    [4, "1/8", 1.0417],
    [6, "1/8", 1.0417],
    [8, "1/16", 0.5208],
  ])("IPC Table 704.1: %s-in pipe needs %s in per ft (%s %%)", (diameter, fraction, percent) => {
    const min = minimumSlope(IPC_704_1, diameter);
    expect(fractionText(min)).toBe(fraction);
    // percent = (in per ft) / 12 x 100, from the table's own SI note
    expect((inPerFt(min) / 12) * 100).toBeCloseTo(percent, 4);
  });

  it("keeps the code's figure as an exact fraction (IPC Table 704.1: 1/8 in per ft is 0.125 exactly)", () => {
    expect(minimumSlope(IPC_704_1, 4)).toEqual({ num: 1, den: 8 });
    expect(inPerFt(minimumSlope(IPC_704_1, 4))).toBe(0.125);
  });

  it("practice: a diameter between two table rows takes the stricter row", () => {
    expect(fractionText(minimumSlope(IPC_704_1, 2.75))).toBe("1/4");
    expect(fractionText(minimumSlope(IPC_704_1, 7))).toBe("1/8");
    expect(fractionText(minimumSlope(IPC_704_1, 10))).toBe("1/16");
  });

  it("memory: Uniform Plumbing Code 708.1 applies 1/4 in per ft by default, labelled as recalled", () => {
    expect(fractionText(minimumSlope(UPC_708_1, 4))).toBe("1/4");
    expect(UPC_708_1.basis).toBe("memory");
    expect(IPC_704_1.basis).toBe("published");
  });
});

describe("grade between locate marks (derived: elevation = ground - depth; grade = fall / run)", () => {
  it("trade reference §2 worked example: ground 100.00 and 99.50 ft, depths 3.0 and 3.2 ft, 40 ft apart: 0.0175 ft/ft = 0.21 in/ft", () => {
    const g = gradeBetween(mark(0, 3.0, 100), mark(40, 3.2, 99.5));
    expect(g.slopeFtPerFt).toBeCloseTo(0.0175, 10);
    expect(g.slopeFtPerFt * 12).toBeCloseTo(0.21, 10);
    expect(g.assumedLevelGround).toBe(false);
  });

  it("the worked example lies below 1/4 and above 1/8 in per ft: it meets the IPC for 4-in pipe, not the UPC default", () => {
    const record = plainLine({ locates: [mark(5, 3.0, 100), mark(45, 3.2, 99.5)] });
    const ipc = evaluate(record).grades[0];
    expect(ipc.inPerFt).toBeCloseTo(0.21, 10);
    expect(ipc.percent).toBeCloseTo(1.75, 10);
    expect(ipc.minimumInPerFt).toBe(0.125);
    expect(ipc.meetsMinimum).toBe(true);
    const upc = evaluate(record, { jurisdiction: "upc" }).grades[0];
    expect(upc.minimumInPerFt).toBe(0.25);
    expect(upc.meetsMinimum).toBe(false);
  });

  it("with a ground elevation missing, takes the ground as level and says so", () => {
    const g = gradeBetween(mark(0, 3.0, 100), mark(40, 3.2, null));
    expect(g.assumedLevelGround).toBe(true);
    expect(g.slopeFtPerFt).toBeCloseTo(0.2 / 40, 12);
  });

  it("reads a line that gets shallower toward the main as running uphill, which never meets a minimum", () => {
    const e = evaluate(plainLine({ locates: [mark(10, 4), mark(30, 3.5)] }));
    expect(e.grades[0].slopeFtPerFt).toBeLessThan(0);
    expect(e.grades[0].meetsMinimum).toBe(false);
    expect(e.summary.some((b) => b.includes("runs uphill") && b.includes("10 ft") && b.includes("30 ft"))).toBe(true);
  });

  it("exactly 1/8 in per ft meets the 1/8 minimum (the comparison is against the exact fraction)", () => {
    const e = evaluate(plainLine({ locates: [mark(0, 2), mark(48, 2.5)] }));
    expect(e.grades[0].inPerFt).toBeCloseTo(0.125, 12);
    expect(e.grades[0].meetsMinimum).toBe(true);
  });

  it("labels every grade an estimate, pairs neighbouring marks in footage order, and uses the narrowest pipe between them", () => {
    const record = plainLine({
      segments: [
        { from: 0, to: 20, material: "pvc", diameterIn: 4 },
        { from: 20, to: 60, material: "vitrified_clay", diameterIn: 8 },
      ],
      locates: [mark(50, 3.4), mark(10, 2), mark(30, 3)],
    });
    const grades = evaluate(record).grades;
    expect(grades.map((g) => [g.from, g.to])).toEqual([
      [10, 30],
      [30, 50],
    ]);
    expect(grades.every((g) => g.estimate)).toBe(true);
    expect(grades[0].diameterIn).toBe(4);
    expect(grades[0].minimumInPerFt).toBe(0.125);
    expect(grades[1].diameterIn).toBe(8);
    expect(grades[1].minimumInPerFt).toBe(0.0625);
  });

  it("accepts a jurisdiction's own rule set beside the built-in ones", () => {
    const strict: SlopeRuleSet = {
      id: "town",
      name: "Town rule",
      source: "Invented test rule",
      basis: "practice",
      rows: [{ belowDiameterIn: null, minimum: { num: 1, den: 2 } }],
    };
    const e = evaluate(plainLine(), { jurisdiction: strict });
    expect(e.slopeRules.id).toBe("town");
    expect(e.grades.every((g) => g.minimumInPerFt === 0.5 && !g.meetsMinimum)).toBe(true);
  });
});

describe("sonde depth from its two nulls (derived: dipole field, depth = spacing / sqrt 2)", () => {
  it("trade reference §2: null spacing 5.0 ft gives 3.54 ft", () => {
    expect(sondeDepthFromNulls(5)).toBeCloseTo(3.54, 2);
  });
});
