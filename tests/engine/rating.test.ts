import { describe, expect, it } from "vitest";

import { evaluate, FINDING_TYPES, parseRecord, rate, SEVERITY_LABELS, type RecordInput } from "../../lib/engine";
import { POINTS_BY_GRADE, scoredItems } from "../../lib/engine/rating";
import { plainLine, withFindings } from "./fixtures/records";

function rated(input: RecordInput) {
  const r = parseRecord(input);
  if (!r.ok) throw new Error(JSON.stringify(r.problems));
  return rate(r.record);
}

describe("finding groups", () => {
  it("every finding type is structural or service and has a buyer-facing label", () => {
    for (const info of Object.values(FINDING_TYPES)) {
      expect(["structural", "service"]).toContain(info.group);
      expect(info.label.length).toBeGreaterThan(0);
    }
    expect(FINDING_TYPES.fracture.group).toBe("structural");
    expect(FINDING_TYPES.sag.group).toBe("structural");
    expect(FINDING_TYPES.roots.group).toBe("service");
    expect(FINDING_TYPES.grease.group).toBe("service");
  });
});

describe("Gradeline severity method v1 (own method, lib/engine/README.md)", () => {
  it("labels the scale Sound, Minor, Moderate, Serious, Critical", () => {
    expect(Object.values(SEVERITY_LABELS)).toEqual(["Sound", "Minor", "Moderate", "Serious", "Critical"]);
  });

  it("a line with no findings is Sound, with both group grades 0", () => {
    const r = rated(plainLine());
    expect(r).toMatchObject({ severity: 1, severityLabel: "Sound", structuralGrade: 0, serviceGrade: 0 });
    expect(r.density.points).toBe(0);
  });

  it("structural and service grades are the peak of each group", () => {
    const r = rated(
      withFindings([
        { at: 5, type: "roots", grade: 3 },
        { at: 8, type: "grease", grade: 2 },
        { at: 20, type: "crack", grade: 2 },
      ]),
    );
    expect(r.structuralGrade).toBe(2);
    expect(r.serviceGrade).toBe(3);
    expect(r.severity).toBe(3);
  });

  it("the severity is at least the worst single finding", () => {
    expect(rated(withFindings([{ at: 30, type: "fracture", grade: 4 }])).severity).toBe(4);
    expect(rated(withFindings([{ at: 30, type: "break_or_hole", grade: 5 }])).severity).toBe(5);
  });

  it("dense defects lift the rating one step above the worst finding: six grade-2 root joints in 60 ft read Moderate", () => {
    const roots = [8, 16, 24, 32, 40, 48].map((at) => ({ at, type: "roots" as const, grade: 2 }));
    const r = rated(withFindings(roots));
    // 6 x 3 points over 60 ft = 30 per 100 ft, density grade 3
    expect(r.density.points).toBe(18);
    expect(r.density.perHundredFt).toBeCloseTo(30, 10);
    expect(r.density.grade).toBe(3);
    expect(r.severity).toBe(3);
    expect(r.reasons.some((x) => x.includes("many defects for the length of line"))).toBe(true);
    // two of them are not dense: 6 points, 10 per 100 ft, density grade 2
    expect(rated(withFindings(roots.slice(0, 2))).severity).toBe(2);
  });

  it("density never lifts more than one step, nor to Critical", () => {
    const many = Array.from({ length: 40 }, (_, i) => ({ at: i * 1.5, type: "crack" as const, grade: 1 }));
    const r = rated(withFindings(many));
    // 40 points over 60 ft = 67 per 100 ft, density grade 4; the worst finding is grade 1
    expect(r.density.grade).toBe(4);
    expect(r.severity).toBe(2);
    const serious = Array.from({ length: 12 }, (_, i) => ({ at: i * 5, type: "fracture" as const, grade: 4 }));
    const s = rated(withFindings(serious));
    expect(s.density.grade).toBe(5);
    expect(s.severity).toBe(4);
  });

  it("short lines are measured over 50 ft at least, so one defect in a short run is not a dense line", () => {
    const short = plainLine({
      segments: [{ from: 0, to: 10, material: "pvc", diameterIn: 4 }],
      surveyEnd: { at: 10, reason: "reached_main" },
      boundaryAt: null,
      locates: [],
      findings: [{ at: 5, type: "crack", grade: 3 }],
    });
    const r = rated(short);
    expect(r.density.overFt).toBe(50);
    expect(r.density.perHundredFt).toBeCloseTo(16, 10);
    expect(r.severity).toBe(3);
  });

  it("a continuous defect scores once for each started 5 ft", () => {
    const r = parseRecord(withFindings([{ at: 10, to: 21, type: "deposits", grade: 2 }]));
    if (!r.ok) throw new Error("bad fixture");
    const items = scoredItems(r.record.findings);
    expect(items.map((i) => i.at)).toEqual([10, 15, 20]);
    expect(items.every((i) => i.score === POINTS_BY_GRADE[2])).toBe(true);
  });

  it("a collapse is Critical whatever its grade", () => {
    const r = rated(withFindings([{ at: 30, type: "collapse", grade: 3 }]));
    expect(r.severity).toBe(5);
    expect(r.severityLabel).toBe("Critical");
    expect(r.reasons[0]).toContain("collapsed at 30 ft");
  });

  it("a survey that could not pass a bad stretch is Critical", () => {
    const record = withFindings([{ at: 39, to: 40, type: "deformation", grade: 3, lossPct: 15 }], {
      segments: [{ from: 0, to: 40, material: "bituminous_fibre", diameterIn: 4 }],
      surveyEnd: { at: 40, reason: "could_not_pass" },
      locates: [],
    });
    const r = rated(record);
    expect(r.severity).toBe(5);
    expect(r.reasons[0]).toContain("could not pass at 40 ft");
  });

  it("a survey stopped in the line with nothing bad there is at least Moderate; one that ran out of cable is not", () => {
    const base = {
      segments: [{ from: 0, to: 40, material: "vitrified_clay" as const, diameterIn: 4 }],
      locates: [],
      boundaryAt: null,
    };
    const blocked = rated(withFindings([{ at: 10, type: "crack", grade: 2 }], { ...base, surveyEnd: { at: 40, reason: "blocked" } }));
    expect(blocked.severity).toBe(3);
    expect(blocked.reasons.some((x) => x.includes("not seen"))).toBe(true);
    const cable = rated(withFindings([{ at: 10, type: "crack", grade: 2 }], { ...base, surveyEnd: { at: 40, reason: "cable_end" } }));
    expect(cable.severity).toBe(2);
    // a grade-3 finding far from where the camera stopped is not what stopped it
    const far = rated(withFindings([{ at: 10, type: "crack", grade: 3 }], { ...base, surveyEnd: { at: 40, reason: "could_not_pass" } }));
    expect(far.severity).toBe(3);
  });

  it("the evaluation carries the method's name and the engine version", () => {
    const e = evaluate(plainLine());
    expect(e.severityMethod).toBe("gradeline-severity-v1");
    expect(e.engineVersion).toMatch(/^\d+\.\d+\.\d+$/);
  });
});
