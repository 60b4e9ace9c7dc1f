import { describe, expect, it } from "vitest";

import { emptyFinding, emptySegment, fromRecord } from "@/app/(inspector)/jobs/[id]/work/draft-record";
import {
  fieldId,
  fieldLabel,
  focusTargets,
  listProblems,
  problemMessage,
  proposeFootage,
  recordPath,
  sectionOf,
  splitPath,
} from "@/app/(inspector)/jobs/[id]/work/problem-fields";

describe("problems and the fields they concern", () => {
  it("splits a record path into keys and indices", () => {
    expect(splitPath("segments[2].to")).toEqual(["segments", 2, "to"]);
    expect(splitPath("clips")).toEqual(["clips"]);
  });

  it("maps editor names to record paths and record paths to control ids", () => {
    expect(recordPath("segments.2.to")).toBe("segments[2].to");
    expect(recordPath("boundary.at")).toBe("boundaryAt");
    expect(recordPath("findings.0.second")).toBe("findings[0].clipSecond");
    expect(fieldId("segments[2].to")).toBe("f-segments-2-to");
  });

  it("falls back from the field to its item and then to the step's heading", () => {
    expect(focusTargets("findings[1].lossPct")).toEqual(["f-findings-1-lossPct", "f-findings-1", "f-findings", "section-findings"]);
  });

  it("puts each path in its step", () => {
    expect(sectionOf("surveyEnd.at")).toBe("profile");
    expect(sectionOf("segments[0].material")).toBe("profile");
    expect(sectionOf("clips")).toBe("clips");
    expect(sectionOf("narrative")).toBe("narrative");
    expect(sectionOf("baseRevision")).toBe("review");
  });

  it("names the field in words, with the finding's type when known", () => {
    const form = fromRecord({});
    form.findings = [{ ...emptyFinding(), type: "roots" }];
    expect(fieldLabel("segments[2].to")).toBe("Segment 3: end");
    expect(fieldLabel("findings[0].lossPct", form)).toBe("Finding 1 (Roots): share lost");
    expect(fieldLabel("surveyEnd.reason")).toBe("Survey end: why it ended");
    expect(fieldLabel("clips")).toBe("Clips");
  });

  it("says what to enter for a blank field instead of the engine's list of codes", () => {
    const form = fromRecord({});
    form.segments = [emptySegment()];
    expect(problemMessage("segments[0].material", "must be one of cast_iron, vitrified_clay", form)).toBe("Choose the material.");
    form.segments[0].to = "500";
    expect(problemMessage("segments[0].to", "the line profile ends at 500 ft but the survey ended at 74 ft", form)).toMatch(
      /^The line profile ends/,
    );
  });

  it("lists problems in the order of the steps", () => {
    const form = fromRecord({});
    const list = listProblems({ narrative: ["n"], "findings[0].at": ["f"], clips: ["c"], "access.kind": ["a"] }, form);
    expect(list.map((p) => p.section)).toEqual(["clips", "access", "findings", "narrative"]);
  });
});

describe("the footage proposed from a clip second", () => {
  it("adds the seconds pushed at the pushing speed to the clip's start footage", () => {
    expect(proposeFootage(12, 8.4, 1)).toBe(20.4);
    expect(proposeFootage(12, 10, 0.5)).toBe(17);
  });

  it("counts from 0 ft when the clip has no start footage, and rounds to a tenth", () => {
    expect(proposeFootage(null, 3.33, 1)).toBe(3.3);
  });

  it("ignores a speed that is not a positive number", () => {
    expect(proposeFootage(5, 10, Number.NaN)).toBe(5);
    expect(proposeFootage(5, 10, -1)).toBe(5);
  });
});
