import { describe, expect, it } from "vitest";

import { emptyFinding, emptySegment, fromRecord, localProblems, toRecord } from "@/app/(inspector)/jobs/[id]/work/draft-record";
import { CLAY_LATERAL_1950S, tryEvaluate } from "@/lib/engine";

describe("the workspace draft and the engine's record", () => {
  it("an empty draft opens as an empty form with the boundary unknown", () => {
    const form = fromRecord({});
    expect(form.segments).toEqual([]);
    expect(form.findings).toEqual([]);
    expect(form.boundary.known).toBe("unknown");
    expect(toRecord(form).boundaryAt).toBeNull();
  });

  it("a complete record survives the trip through the editors and still evaluates the same", () => {
    const back = toRecord(fromRecord(CLAY_LATERAL_1950S));
    const direct = tryEvaluate(CLAY_LATERAL_1950S);
    const viaForm = tryEvaluate(back);
    expect(direct.ok && viaForm.ok).toBe(true);
    if (direct.ok && viaForm.ok) expect(viaForm.evaluation.severity).toBe(direct.evaluation.severity);
    expect(back.segments.map((s) => [s.from, s.to])).toEqual(CLAY_LATERAL_1950S.segments.map((s) => [s.from, s.to]));
    expect(back.boundaryAt).toBe(58);
  });

  it("each segment starts where the one before ends, so the profile tiles by construction", () => {
    const form = fromRecord({});
    form.segments = [
      { ...emptySegment(), to: "9", material: "cast_iron", diameterIn: "4" },
      { ...emptySegment("3"), to: "20", material: "pvc", diameterIn: "4" },
    ];
    expect(toRecord(form).segments.map((s) => s.from)).toEqual([0, 9]);
  });

  it("blank numbers are left out, so the engine names the field that needs a value", () => {
    const form = fromRecord({});
    form.access.kind = "cleanout_inside";
    form.surveyEnd = { at: "20", reason: "reached_main" };
    form.segments = [{ ...emptySegment(), to: "", material: "pvc", diameterIn: "4" }];
    const result = tryEvaluate(toRecord(form));
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problems.map((p) => p.path)).toContain("segments[0].to");
  });

  it("keeps a water depth only for a sag and a loss share only for the types that lose area or diameter", () => {
    const form = fromRecord({});
    form.findings = [
      { ...emptyFinding(), at: "5", type: "crack", grade: "2", lossPct: "30", waterDepthPct: "40" },
      { ...emptyFinding(), at: "6", type: "sag", grade: "3", lossPct: "30", waterDepthPct: "40" },
      { ...emptyFinding(), at: "7", type: "roots", grade: "3", lossPct: "30", waterDepthPct: "40" },
      { ...emptyFinding(), at: "8", type: "deformation", grade: "3", lossPct: "12" },
    ];
    const f = toRecord(form).findings;
    expect([f[0].lossPct, f[0].waterDepthPct]).toEqual([null, null]);
    expect([f[1].lossPct, f[1].waterDepthPct]).toEqual([null, 40]);
    expect([f[2].lossPct, f[2].waterDepthPct]).toEqual([30, null]);
    expect(f[3].lossPct).toBe(12);
  });

  it("stores the clip and its second as the buyer's report reads them (clipId, clipSecond)", () => {
    const form = fromRecord({});
    form.findings = [{ ...emptyFinding(), at: "12.4", type: "roots", grade: "2", clipId: "c1", second: "8.4", stillId: "s1" }];
    const [f] = toRecord(form).findings;
    expect(f).toMatchObject({ clipId: "c1", clipSecond: 8.4, stillId: "s1" });
    expect(fromRecord(toRecord(form)).findings[0].second).toBe("8.4");
  });

  it("a known boundary without a footage is a problem of its own; unknown is not", () => {
    const form = fromRecord({});
    form.boundary = { known: "yes", at: "" };
    expect(Object.keys(localProblems(form))).toEqual(["boundaryAt"]);
    form.boundary = { known: "unknown", at: "" };
    expect(localProblems(form)).toEqual({});
    expect(fromRecord({ boundaryKnown: true, boundaryAt: null }).boundary.known).toBe("yes");
  });

  it("reads a damaged draft without throwing", () => {
    const form = fromRecord({ segments: "nope", findings: [null, 3, { type: "not-a-type", at: "x" }], access: [] });
    expect(form.segments).toEqual([]);
    expect(form.findings).toHaveLength(1);
    expect(form.findings[0].type).toBe("");
  });
});
