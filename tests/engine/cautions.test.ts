import { describe, expect, it } from "vitest";

import { evaluate, type Caution, type RecordInput } from "../../lib/engine";
import { FLAT_RATES } from "./fixtures/rates";
import { marksAt, plainLine, withFindings } from "./fixtures/records";

const ids = (cs: Caution[]) => cs.map((c) => c.id);
const fractureAt = (depthFt: number, extra: Partial<RecordInput> = {}) =>
  evaluate(withFindings([{ at: 30, type: "fracture", grade: 4 }], { boundaryAt: null, locates: marksAt(depthFt, "soil"), ...extra }), {
    rates: FLAT_RATES,
  });

describe("cautions", () => {
  it("always says a camera inspection is no warranty and readings are approximate", () => {
    const c = ids(evaluate(plainLine()).cautions);
    expect(c).toContain("not-a-warranty");
    expect(c).toContain("approximate-readings");
  });

  it("OSHA 29 CFR 1926.652(a)(1) (published): an excavation option at 5 ft or deeper needs a protective system", () => {
    const deep = fractureAt(5).cautions.find((c) => c.id === "trench-protective-system");
    expect(deep).toBeDefined();
    expect(deep?.source).toBe("OSHA 29 CFR 1926.652(a)(1)");
    expect(deep?.level).toBe("warning");
    expect(deep?.text).toMatch(/28-32 ft \(about 5 ft deep\)/);
    expect(ids(fractureAt(4.9).cautions)).not.toContain("trench-protective-system");
  });

  it("OSHA 29 CFR 1926.651(c)(2) (published): a trench 4 ft or deeper needs a ladder or ramp", () => {
    expect(ids(fractureAt(4).cautions)).toContain("trench-ladder");
    expect(ids(fractureAt(3.9).cautions)).not.toContain("trench-ladder");
  });

  it("the excavation option itself says so at that depth", () => {
    const dig = fractureAt(6).stretches[0].options.find((o) => o.method === "excavate_replace");
    expect(dig?.reason).toMatch(/1926\.652/);
  });

  it("call before you dig (811) whenever an option digs, never for a sound line", () => {
    const call = fractureAt(3).cautions.find((c) => c.id === "call-before-you-dig");
    expect(call?.text).toMatch(/811/);
    expect(ids(evaluate(plainLine()).cautions)).not.toContain("call-before-you-dig");
  });

  it("the public side belongs to the city or utility, and work found there should be reported", () => {
    const e = evaluate(withFindings([{ at: 55, type: "fracture", grade: 4 }], { locates: marksAt(3, "soil") }));
    const pub = e.cautions.find((c) => c.id === "public-side");
    expect(pub?.level).toBe("warning");
    expect(pub?.at).toBe(45);
    expect(pub?.text).toMatch(/From 45 ft on, the line is public: it belongs to the city or utility/);
    expect(pub?.text).toMatch(/53-57 ft/);
    expect(evaluate(plainLine()).cautions.find((c) => c.id === "public-side")?.level).toBe("info");
  });

  it("an unknown boundary says to ask the city", () => {
    expect(ids(evaluate(plainLine({ boundaryAt: null })).cautions)).toContain("boundary-unknown");
    expect(ids(evaluate(plainLine()).cautions)).not.toContain("boundary-unknown");
  });

  it("a survey that did not reach the main says the rest was not seen", () => {
    const e = evaluate(plainLine({ surveyEnd: { at: 60, reason: "cable_end" } }));
    expect(e.cautions.find((c) => c.id === "line-not-seen-beyond")?.at).toBe(60);
    expect(ids(evaluate(plainLine()).cautions)).not.toContain("line-not-seen-beyond");
  });

  it("prices with no locate marks assume the rate table's depth, and say so", () => {
    const e = fractureAt(3, { locates: [] });
    expect(e.stretches[0].depthAssumed).toBe(true);
    expect(e.stretches[0].depthFt).toBe(FLAT_RATES.assumedDepthFt);
    expect(ids(e.cautions)).toContain("depth-not-located");
  });

  it("repairs carry the confined-space caution and the estimate-not-quote note with the rate table's date", () => {
    const e = fractureAt(3);
    expect(ids(e.cautions)).toContain("confined-space");
    expect(e.cautions.find((c) => c.id === "estimates-not-quotes")?.text).toContain("2026-02-01");
  });

  it("every caution is labelled published, derived, practice or memory, and a published one names its source", () => {
    for (const c of fractureAt(6).cautions) {
      expect(["published", "derived", "practice", "memory"]).toContain(c.basis);
      if (c.basis === "published") expect(c.source).toBeTruthy();
    }
  });
});
