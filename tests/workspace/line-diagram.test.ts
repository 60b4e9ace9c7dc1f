import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";

import { assignLanes, axisStep, axisTicks, clockText, depthAt, LineDiagram } from "@/components/line-diagram";
import { CLAY_LATERAL_1950S, evaluate, parseRecord } from "@/lib/engine";

describe("the line diagram's footage axis", () => {
  it("ticks every 5 ft on a short line, 10 ft on a usual one, 25 ft on a long one", () => {
    expect(axisStep(30)).toBe(5);
    expect(axisStep(74)).toBe(10);
    expect(axisStep(220)).toBe(25);
    expect(axisStep(600)).toBe(50);
  });

  it("runs from 0 to the first tick at or past the end", () => {
    expect(axisTicks(74)).toEqual({ step: 10, max: 80, ticks: [0, 10, 20, 30, 40, 50, 60, 70, 80] });
    expect(axisTicks(40).max).toBe(40);
    expect(axisTicks(0).ticks).toEqual([0, 5]);
  });
});

describe("the line diagram's layout helpers", () => {
  it("stacks overlapping marks into lanes and reuses a lane once it is free", () => {
    expect(
      assignLanes([
        { x0: 0, x1: 20 },
        { x0: 10, x1: 30 },
        { x0: 40, x1: 60 },
      ]),
    ).toEqual([0, 1, 0]);
  });

  it("never uses more lanes than allowed", () => {
    const spans = Array.from({ length: 10 }, () => ({ x0: 0, x1: 20 }));
    expect(Math.max(...assignLanes(spans, 4, 3))).toBe(2);
  });

  it("interpolates depth between locate marks and holds it beyond them", () => {
    const marks = [
      { at: 10, depthFt: 2 },
      { at: 30, depthFt: 4 },
    ];
    expect(depthAt(marks, 20)).toBe(3);
    expect(depthAt(marks, 0)).toBe(2);
    expect(depthAt(marks, 50)).toBe(4);
    expect(depthAt([], 5)).toBeNull();
  });

  it("reads a clock position or range in words", () => {
    expect(clockText("3")).toBe("3 o'clock");
    expect(clockText("10-2")).toBe("10 to 2 o'clock");
  });
});

describe("the line diagram on the server", () => {
  const parsed = parseRecord(CLAY_LATERAL_1950S);
  if (!parsed.ok) throw new Error("example record does not parse");
  const html = renderToStaticMarkup(createElement(LineDiagram, { record: parsed.record, evaluation: evaluate(CLAY_LATERAL_1950S) }));

  it("renders one focusable button per finding in each of its two drawings (wide, phone), labelled with its type, footage and grade", () => {
    expect(html.match(/role="button"/g)).toHaveLength(CLAY_LATERAL_1950S.findings.length * 2);
    expect(html).toContain('aria-label="Fracture, 44.0 ft, grade 4 (Serious), 2 to 5 o&#x27;clock"');
    expect(html).toContain('tabindex="0"');
  });

  it("marks the boundary, the approximate depths, the materials and where the survey ended", () => {
    expect(html).toContain("Public side begins");
    expect(html).toContain("~2.6 ft");
    expect(html).toContain("cast iron 4 in");
    expect(html).toContain("reached the main");
  });

  it("describes the whole line in text for screen readers and print", () => {
    expect(html).toContain("The public side begins at 58.0 ft.");
    expect(html).toContain("Finding 7: Fracture, 44.0 ft, grade 4 (Serious)");
  });

  it("draws a half-typed draft without throwing", () => {
    const draft = renderToStaticMarkup(
      createElement(LineDiagram, {
        record: { segments: [{ from: 0 }], findings: [{ at: 3, type: "roots" }], surveyEnd: { at: undefined } },
      }),
    );
    expect(draft).toContain("Enter the survey end");
    expect(draft).not.toContain('role="button"');
  });
});
