import { describe, expect, it } from "vitest";

import { parseRecord, type Problem } from "../../lib/engine";
import { plainLine, withFindings } from "./fixtures/records";

function problemsOf(input: unknown): Problem[] {
  const r = parseRecord(input);
  if (r.ok) throw new Error("expected the record to be refused");
  return r.problems;
}
const paths = (input: unknown) => problemsOf(input).map((p) => p.path);

const threeSegments = (second: { from: number; to: number }, thirdFrom = second.to) =>
  plainLine({
    segments: [
      { from: 0, to: 20, material: "cast_iron", diameterIn: 4 },
      { ...second, material: "vitrified_clay", diameterIn: 4 },
      { from: thirdFrom, to: 60, material: "pvc", diameterIn: 4 },
    ],
  });

describe("parseRecord accepts a good record", () => {
  it("returns it in feet and inches, with nullish fields made null", () => {
    const r = parseRecord(withFindings([{ at: 12, type: "roots", grade: 2 }]));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.sourceUnits).toBe("imperial");
    expect(r.record.findings[0]).toEqual({ at: 12, to: null, type: "roots", grade: 2, clock: null, lossPct: null, waterDepthPct: null });
    expect(r.record.boundaryAt).toBe(45);
    expect("units" in r.record).toBe(false);
  });

  it("takes a missing boundary as unknown", () => {
    const { boundaryAt: _b, ...rest } = plainLine();
    const r = parseRecord(rest);
    expect(r.ok && r.record.boundaryAt).toBeNull();
  });
});

describe("parseRecord refuses a bad record with every problem and its path", () => {
  it("a gap between segments is reported on the later segment's start", () => {
    const problems = problemsOf(threeSegments({ from: 22, to: 40 }, 40));
    expect(problems).toHaveLength(1);
    expect(problems[0].path).toBe("segments[1].from");
    expect(problems[0].message).toMatch(/gap/);
  });

  it("an overlap is reported the same way", () => {
    const problems = problemsOf(threeSegments({ from: 20, to: 42 }, 38));
    expect(problems.map((p) => p.path)).toEqual(["segments[2].from"]);
    expect(problems[0].message).toMatch(/overlap/);
  });

  it("a segment that ends where it starts, or before, is reported on its end", () => {
    expect(paths(threeSegments({ from: 20, to: 20 }, 20))).toEqual(["segments[1].to"]);
  });

  it("the line profile must start at the access point and end where the survey ended", () => {
    const record = plainLine({ segments: [{ from: 2, to: 55, material: "pvc", diameterIn: 4 }] });
    expect(paths(record)).toEqual(["segments[0].from", "segments[0].to"]);
  });

  it("findings outside the survey are refused, at their start or their end", () => {
    const record = withFindings([
      { at: 61, type: "crack", grade: 2 },
      { at: 50, to: 64, type: "deposits", grade: 2 },
      { at: 30, to: 25, type: "crack", grade: 2 },
    ]);
    expect(paths(record)).toEqual(["findings[0].at", "findings[1].to", "findings[2].to"]);
  });

  it.each([0, 6, 2.5, -1])("a grade of %s is outside 1-5 (whole numbers)", (grade) => {
    expect(paths(withFindings([{ at: 5, type: "crack", grade }]))).toEqual(["findings[0].grade"]);
  });

  it("a negative depth is refused", () => {
    const record = plainLine({ locates: [{ at: 10, depthFt: -0.5, groundElevationFt: null, surface: "soil" }] });
    const problems = problemsOf(record);
    expect(problems).toEqual([{ path: "locates[0].depthFt", message: "a depth cannot be negative" }]);
  });

  it("a locate mark past the survey end, or two marks at one footage, are refused", () => {
    const record = plainLine({
      locates: [
        { at: 10, depthFt: 2, groundElevationFt: null, surface: "soil" },
        { at: 10, depthFt: 2.1, groundElevationFt: null, surface: "soil" },
        { at: 70, depthFt: 3, groundElevationFt: null, surface: "soil" },
      ],
    });
    expect(paths(record)).toEqual(["locates[1].at", "locates[2].at"]);
  });

  it("a sag needs its water depth, and only a sag has one", () => {
    const record = withFindings([
      { at: 20, to: 26, type: "sag", grade: 3 },
      { at: 30, type: "roots", grade: 2, waterDepthPct: 20 },
    ]);
    expect(paths(record)).toEqual(["findings[0].waterDepthPct", "findings[1].waterDepthPct"]);
  });

  it("unknown finding types, clock positions, materials and percentages over 100 are refused", () => {
    const record = plainLine({
      segments: [{ from: 0, to: 60, material: "lead" as "pvc", diameterIn: 4 }],
      findings: [
        { at: 5, type: "tree" as "roots", grade: 2 },
        { at: 6, type: "roots", grade: 2, clock: "13", lossPct: 140 },
      ],
    });
    expect(paths(record)).toEqual(["segments[0].material", "findings[0].type", "findings[1].clock", "findings[1].lossPct"]);
  });

  it("reports shape problems and cross-field problems together, never stopping at the first", () => {
    const record = {
      ...threeSegments({ from: 22, to: 40 }, 40),
      surveyEnd: { at: 60, reason: "lost" },
      findings: [
        { at: 5, type: "crack", grade: 9 },
        { at: 90, type: "crack", grade: 2 },
      ],
      locates: [{ at: 10, depthFt: -1, surface: "soil" }],
    };
    expect(paths(record).sort()).toEqual(
      ["findings[0].grade", "findings[1].at", "locates[0].depthFt", "segments[1].from", "surveyEnd.reason"].sort(),
    );
  });

  it("every problem has a plain message", () => {
    const problems = problemsOf(withFindings([{ at: 5, type: "crack", grade: 7 }]));
    expect(problems[0].message).toBe("must be from 1 to 5");
  });

  it("refuses what is not a record at all, and an unknown unit system", () => {
    expect(problemsOf(null)).toEqual([{ path: "record", message: "must be an object (the inspection record)" }]);
    expect(problemsOf([])[0].path).toBe("record");
    expect(paths({ ...plainLine(), units: "cubits" })).toEqual(["units"]);
    expect(paths({ access: { kind: "cleanout_inside" } })).toEqual(["segments", "surveyEnd", "locates", "findings"]);
  });

  it("refuses numbers that are not finite", () => {
    expect(paths(withFindings([{ at: Number.NaN, type: "crack", grade: 2 }]))).toEqual(["findings[0].at"]);
    expect(paths(plainLine({ boundaryAt: Number.POSITIVE_INFINITY }))).toEqual(["boundaryAt"]);
  });
});
