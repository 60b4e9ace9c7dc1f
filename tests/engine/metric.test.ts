import { describe, expect, it } from "vitest";

import { evaluate, parseRecord } from "../../lib/engine";
import { nominalDiameterIn } from "../../lib/engine/metric";
import metric from "./fixtures/metric-clay.json";

describe("a metric record is converted at the edge", () => {
  it("metres become feet (1 ft = 0.3048 m exactly) and millimetres inches (1 in = 25.4 mm exactly)", () => {
    const r = parseRecord(metric);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.sourceUnits).toBe("metric");
    expect(r.record.surveyEnd.at).toBeCloseTo(18.3 / 0.3048, 10);
    expect(r.record.segments[0].to).toBeCloseTo(6 / 0.3048, 10);
    expect(r.record.segments[1].from).toBe(r.record.segments[0].to);
    expect(r.record.boundaryAt).toBeCloseTo(15.2 / 0.3048, 10);
    expect(r.record.locates[0].depthFt).toBeCloseTo(0.8 / 0.3048, 10);
    expect(r.record.findings[1].to).toBeCloseTo(11.5 / 0.3048, 10);
    expect(r.record.findings[1].waterDepthPct).toBe(20);
  });

  it("practice: nominal metric sizes read as the inch sizes they stand for (DN 100 = 4 in, DN 150 = 6 in, DN 200 = 8 in); others convert exactly", () => {
    expect(nominalDiameterIn(100)).toBe(4);
    expect(nominalDiameterIn(150)).toBe(6);
    expect(nominalDiameterIn(200)).toBe(8);
    expect(nominalDiameterIn(110)).toBeCloseTo(110 / 25.4, 10);
  });

  it("DN 200 gets the 8-in row of IPC Table 704.1 (1/16 in per ft), not the 6-in one", () => {
    const m = structuredClone(metric);
    m.segments[1].diameterMm = 200;
    const e = evaluate(m);
    expect(e.grades[0].diameterIn).toBe(4);
    const r = parseRecord(m);
    expect(r.ok && r.record.segments[1].diameterIn).toBe(8);
  });

  it("evaluates in feet and reports the source units", () => {
    const e = evaluate(metric);
    expect(e.sourceUnits).toBe("metric");
    expect(e.lengths.surveyed).toBeCloseTo(60.04, 2);
    expect(e.lengths.public).toBeCloseTo((18.3 - 15.2) / 0.3048, 9);
  });

  it("problems name the metric fields, and an imperial field in a metric record is refused", () => {
    const m = structuredClone(metric) as Record<string, unknown> & typeof metric;
    const seg = m.segments[0] as Record<string, unknown>;
    delete seg.diameterMm;
    seg.diameterIn = 4;
    (m.locates[0] as Record<string, unknown>).depthM = -0.2;
    const r = parseRecord(m);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.problems.map((p) => p.path)).toEqual(["segments[0].diameterMm", "locates[0].depthM"]);
  });

  it("cross-field problems speak in the record's own unit", () => {
    const m = structuredClone(metric);
    m.findings[0].at = 19;
    const r = parseRecord(m);
    expect(!r.ok && r.problems).toEqual([{ path: "findings[0].at", message: "19 m is past the end of the survey (18.3 m)" }]);
  });
});
