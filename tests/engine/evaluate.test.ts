import { describe, expect, it } from "vitest";

import {
  CLAY_LATERAL_1950S,
  DEMO_RATE_TABLE,
  ENGINE_VERSION,
  evaluate,
  EXAMPLE_RECORDS,
  PVC_LATERAL_1990S,
  RecordProblemsError,
  tryEvaluate,
  type RateTable,
} from "../../lib/engine";
import fibrePipe from "./fixtures/fibre-pipe-collapse.json";
import metric from "./fixtures/metric-clay.json";
import { plainLine, withFindings } from "./fixtures/records";
import driveway from "./fixtures/transition-under-driveway.json";

describe("evaluate", () => {
  it("returns every part the issue asks for", () => {
    const e = evaluate(CLAY_LATERAL_1950S);
    for (const key of [
      "lengths",
      "grades",
      "sags",
      "structuralGrade",
      "serviceGrade",
      "density",
      "severity",
      "severityLabel",
      "stretches",
      "cautions",
      "summary",
      "engineVersion",
    ]) {
      expect(e).toHaveProperty(key);
    }
    expect(e.engineVersion).toBe(ENGINE_VERSION);
    expect(e.lengths).toMatchObject({ surveyed: 74, private: 58, public: 16 });
    expect(e.sags).toHaveLength(1);
    expect(e.sags[0].waterDepthPct).toBe(30);
    expect(e.sags[0].areaFilledPct).toBeCloseTo(25.23, 2);
    expect(e.grades).toHaveLength(4);
    expect(e.rates).toMatchObject({ demo: true, effectiveDate: DEMO_RATE_TABLE.effectiveDate });
  });

  it("rates the example 1950s clay lateral Serious, with two stretches, one on each side", () => {
    const e = evaluate(CLAY_LATERAL_1950S);
    expect([e.severity, e.severityLabel, e.structuralGrade, e.serviceGrade]).toEqual([4, "Serious", 4, 3]);
    expect(e.stretches.map((s) => [s.from, s.to, s.side])).toEqual([
      [17.5, 46, "private"],
      [61, 65, "public"],
    ]);
  });

  it("rates the example PVC lateral Minor with nothing to repair", () => {
    const e = evaluate(PVC_LATERAL_1990S);
    expect([e.severity, e.severityLabel, e.stretches.length]).toEqual([2, "Minor", 0]);
    expect(Object.keys(EXAMPLE_RECORDS)).toEqual(["clayLateral1950s", "pvcLateral1990s"]);
  });

  it("rates a collapsed fibre line Critical, and prices only digging at the collapse, in the street", () => {
    const e = evaluate(fibrePipe);
    expect(e.severity).toBe(5);
    const last = e.stretches.at(-1);
    expect(last).toMatchObject({ side: "public", surface: "street", to: 51 });
    const fitting = last?.options.filter((o) => o.fits).map((o) => o.method);
    expect(fitting).toEqual(["spot_repair", "excavate_replace"]);
    expect(e.cautions.map((c) => c.id)).toEqual(
      expect.arrayContaining(["trench-protective-system", "line-not-seen-beyond", "bituminous-fibre", "call-before-you-dig"]),
    );
  });

  it("rates the driveway transition Serious and suggests a trenchless method under the concrete", () => {
    const e = evaluate(driveway);
    expect(e.severity).toBe(4);
    expect(e.stretches).toHaveLength(1);
    expect(e.stretches[0]).toMatchObject({ from: 16.5, to: 24, surface: "hardscape", diametersIn: [4, 6] });
    expect(["lining", "pipe_bursting"]).toContain(e.stretches[0].suggested);
  });

  it("gives the same answer for a record in metres as for the same record in feet", () => {
    const m = evaluate(metric);
    const ft = (v: number) => v / 0.3048;
    const imperial = evaluate({
      access: metric.access,
      segments: [
        { from: 0, to: ft(6), material: "pvc", diameterIn: 4 },
        { from: ft(6), to: ft(18.3), material: "vitrified_clay", diameterIn: 6 },
      ],
      surveyEnd: { at: ft(18.3), reason: "reached_main" },
      boundaryAt: ft(15.2),
      locates: metric.locates.map((l) => ({ at: ft(l.at), depthFt: ft(l.depthM), groundElevationFt: null, surface: "soil" as const })),
      findings: metric.findings.map((f) => ({ ...f, at: ft(f.at), to: "to" in f ? ft(f.to as number) : null }) as never),
    });
    const { sourceUnits: _a, ...mRest } = m;
    const { sourceUnits: _b, ...iRest } = imperial;
    expect(mRest).toEqual(iRest);
    expect(m.sourceUnits).toBe("metric");
  });

  it("refuses an invalid record with every problem, and evaluates nothing", () => {
    const bad = withFindings([
      { at: 5, type: "crack", grade: 0 },
      { at: 80, type: "crack", grade: 2 },
    ]);
    const r = tryEvaluate(bad);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.problems.map((p) => p.path)).toEqual(["findings[0].grade", "findings[1].at"]);
    expect("evaluation" in r).toBe(false);
    let thrown: unknown;
    try {
      evaluate(bad);
    } catch (e) {
      thrown = e;
    }
    expect(thrown).toBeInstanceOf(RecordProblemsError);
    expect((thrown as RecordProblemsError).problems).toEqual(r.problems);
    expect((thrown as Error).message).toMatch(/2 problems: findings\[0\]\.grade/);
  });

  it("refuses a bad rate table or an unknown jurisdiction, naming the option", () => {
    const rates = structuredClone(DEMO_RATE_TABLE) as RateTable;
    rates.methods.lining.perFoot.highCents = 10;
    const r = tryEvaluate(plainLine(), { rates, jurisdiction: "atlantis" });
    expect(!r.ok && r.problems.map((p) => p.path)).toEqual(["options.rates.methods.lining.perFoot.highCents", "options.jurisdiction"]);
  });

  it("uses the rate table it is given", () => {
    const rates = structuredClone(DEMO_RATE_TABLE) as RateTable;
    rates.methods.excavate_replace.perFoot = { lowCents: 100_000, highCents: 200_000 };
    rates.name = "Expensive town";
    const e = evaluate(CLAY_LATERAL_1950S, { rates });
    const base = evaluate(CLAY_LATERAL_1950S);
    const dig = (x: typeof e) => x.stretches[0].options.find((o) => o.method === "excavate_replace")?.costLowCents ?? 0;
    expect(dig(e)).toBeGreaterThan(dig(base));
    expect(e.rates.name).toBe("Expensive town");
  });

  it("does not change the record it is given", () => {
    const record = structuredClone(CLAY_LATERAL_1950S);
    evaluate(record);
    expect(record).toEqual(CLAY_LATERAL_1950S);
  });
});
