import { describe, expect, it } from "vitest";

import { aggregate, bandGrade } from "../../lib/engine";
import { windowPeak } from "../../lib/engine/aggregate";

// published: WSA 05 (Australia's conduit inspection reporting code), third edition, as restated in
// public guidance: structural peak bands up to 5, 15, 40, 60, above; mean bands up to 1.0, 3.0, 5.0,
// 10.0, above; final grade = worse of the peak grade and the mean grade.
const WSA_STRUCTURAL = { peakBands: [5, 15, 40, 60], meanBands: [1, 3, 5, 10] } as const;

describe("peak-and-mean aggregation, checked against a published method's worked example", () => {
  it("WSA 05 worked example: scores 5, 10, 20, 20 over 36.5 m: total 55, mean 1.51, peak 20, peak grade 3, mean grade 2, final 3", () => {
    const items = [
      { at: 2.0, score: 5 },
      { at: 9.5, score: 10 },
      { at: 17.0, score: 20 },
      { at: 30.2, score: 20 },
    ];
    const a = aggregate({ items, length: 36.5, meanPer: 1, peakWindow: 1, ...WSA_STRUCTURAL });
    expect(a.total).toBe(55);
    expect(a.mean).toBeCloseTo(1.51, 2);
    expect(a.peak).toBe(20);
    expect(a.peakGrade).toBe(3);
    expect(a.meanGrade).toBe(2);
    expect(a.finalGrade).toBe(3);
  });

  it("the peak is the largest total inside any 1 m window, so two defects 0.5 m apart add up", () => {
    const items = [
      { at: 10, score: 20 },
      { at: 10.5, score: 25 },
      { at: 20, score: 30 },
    ];
    expect(windowPeak(items, 1)).toBe(45);
    expect(aggregate({ items, length: 36.5, peakWindow: 1, ...WSA_STRUCTURAL }).peakGrade).toBe(4);
    expect(windowPeak(items, 0.4)).toBe(30);
  });

  it("band bounds are inclusive: up to 5 is grade 1, just over 5 is grade 2, over the last bound is grade 5", () => {
    expect(bandGrade(5, WSA_STRUCTURAL.peakBands)).toBe(1);
    expect(bandGrade(5.01, WSA_STRUCTURAL.peakBands)).toBe(2);
    expect(bandGrade(60, WSA_STRUCTURAL.peakBands)).toBe(4);
    expect(bandGrade(61, WSA_STRUCTURAL.peakBands)).toBe(5);
  });

  it("with no peak window the peak is the largest single score", () => {
    const a = aggregate({
      items: [
        { at: 0, score: 3 },
        { at: 0.1, score: 8 },
      ],
      length: 100,
      meanPer: 100,
      peakBands: [1, 3, 8, 20],
      meanBands: [5, 15, 40, 80],
    });
    expect(a.peak).toBe(8);
    expect(a.peakGrade).toBe(3);
    expect(a.mean).toBeCloseTo(11, 12);
    expect(a.meanGrade).toBe(2);
  });

  it("a pipe with nothing scored grades 1 and means 0", () => {
    const a = aggregate({ items: [], length: 20, peakWindow: 1, ...WSA_STRUCTURAL });
    expect(a).toMatchObject({ total: 0, mean: 0, peak: 0, finalGrade: 1 });
  });
});
