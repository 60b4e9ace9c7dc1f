import { describe, expect, it } from "vitest";

import { evaluate, linerWall, REPAIR_METHODS, type RecordInput, type RepairMethod, type Stretch } from "../../lib/engine";
import { FLAT_RATES } from "./fixtures/rates";
import { marksAt, plainLine, withFindings } from "./fixtures/records";
import driveway from "./fixtures/transition-under-driveway.json";

type FindingInput = RecordInput["findings"][number];

const fracture = (at: number, grade = 4): FindingInput => ({ at, type: "fracture", grade });
const opt = (s: Stretch, m: RepairMethod) => {
  const o = s.options.find((x) => x.method === m);
  if (!o) throw new Error(`no ${m} option`);
  return o;
};
function onlyStretch(input: RecordInput): Stretch {
  const { stretches } = evaluate(input, { rates: FLAT_RATES });
  expect(stretches).toHaveLength(1);
  return stretches[0];
}
const inSoil = (findings: FindingInput[], depthFt = 3, extra: Partial<RecordInput> = {}) =>
  withFindings(findings, { boundaryAt: null, locates: marksAt(depthFt, "soil"), ...extra });

describe("stretches that need work", () => {
  it("grade 3 and worse need work, padded 2 ft to sound pipe either side (practice); grade 2 is only watched", () => {
    const e = evaluate(inSoil([fracture(30, 3), { at: 10, type: "crack", grade: 2 }]));
    expect(e.stretches.map((s) => [s.from, s.to])).toEqual([[28, 32]]);
  });

  it("two repairs within 5 ft are one stretch (practice)", () => {
    const e = evaluate(inSoil([fracture(20), fracture(28)]));
    expect(e.stretches.map((s) => [s.from, s.to])).toEqual([[18, 30]]);
    const apart = evaluate(inSoil([fracture(20), fracture(30)]));
    expect(apart.stretches).toHaveLength(2);
  });

  it("a stretch never crosses the boundary: it is split into a private and a public part", () => {
    const e = evaluate(withFindings([{ at: 40, to: 50, type: "deposits", grade: 3 }], { locates: marksAt(3, "soil") }), {
      rates: FLAT_RATES,
    });
    expect(e.stretches.map((s) => [s.from, s.to, s.side])).toEqual([
      [38, 45, "private"],
      [45, 52, "public"],
    ]);
    expect(e.stretches[0].note).toBeNull();
    expect(e.stretches[1].note).toMatch(/belongs to the city or utility/);
  });

  it("a defect just before the boundary keeps its repair margin on the private side", () => {
    const e = evaluate(withFindings([fracture(44)], { locates: marksAt(3, "soil") }));
    expect(e.stretches.map((s) => [s.from, s.to, s.side])).toEqual([[42, 45, "private"]]);
  });

  it("practice: a stretch takes the surface of the nearest marks on its own side of the boundary", () => {
    const locates = [
      { at: 30, depthFt: 3, groundElevationFt: null, surface: "soil" as const },
      { at: 46, depthFt: 4, groundElevationFt: null, surface: "street" as const },
    ];
    const e = evaluate(withFindings([fracture(43), fracture(50)], { locates }));
    expect(e.stretches.map((s) => [s.side, s.surface])).toEqual([
      ["private", "soil"],
      ["public", "street"],
    ]);
  });

  it("every stretch offers every method once, in order; fitting ones priced in whole cents, low <= high; others unpriced", () => {
    const e = evaluate(driveway, { rates: FLAT_RATES });
    for (const s of e.stretches) {
      expect(s.options.map((o) => o.method)).toEqual([...REPAIR_METHODS]);
      for (const o of s.options) {
        expect(o.reason.length).toBeGreaterThan(10);
        if (o.fits) {
          expect(Number.isInteger(o.costLowCents)).toBe(true);
          expect(Number.isInteger(o.costHighCents)).toBe(true);
          expect(o.costLowCents ?? 0).toBeLessThanOrEqual(o.costHighCents ?? -1);
        } else {
          expect(o.costLowCents).toBeNull();
          expect(o.costHighCents).toBeNull();
        }
      }
    }
  });
});

describe("repair rules (practice unless marked)", () => {
  it("a sag holding water over a quarter of the diameter rules out lining there", () => {
    const s = onlyStretch(inSoil([{ at: 20, to: 26, type: "sag", grade: 3, waterDepthPct: 30 }]));
    expect(opt(s, "lining").fits).toBe(false);
    expect(opt(s, "lining").reason).toMatch(/over a quarter/);
    expect(opt(s, "pipe_bursting").fits).toBe(false);
    expect(opt(s, "excavate_replace").fits).toBe(true);
  });

  it("a sag holding exactly a quarter, or less, leaves lining in, and says the liner keeps it", () => {
    const s = onlyStretch(inSoil([{ at: 20, to: 26, type: "sag", grade: 3, waterDepthPct: 25 }]));
    expect(opt(s, "lining").fits).toBe(true);
    expect(opt(s, "lining").reason).toMatch(/keeps the small sag/);
  });

  it("a minor sag inside a stretch still keeps lining out of it", () => {
    const s = onlyStretch(inSoil([fracture(30), { at: 28, to: 31, type: "sag", grade: 2, waterDepthPct: 40 }]));
    expect(opt(s, "lining").fits).toBe(false);
  });

  it("a collapse rules out the trenchless methods there, and leaves digging", () => {
    const s = onlyStretch(inSoil([{ at: 30, type: "collapse", grade: 5 }]));
    for (const m of ["lining", "pipe_bursting"] as const) {
      expect(opt(s, m).fits).toBe(false);
      expect(opt(s, m).reason).toMatch(/collapse at 30 ft rules out trenchless/);
    }
    expect(opt(s, "spot_repair").fits).toBe(true);
    expect(opt(s, "excavate_replace").fits).toBe(true);
    expect(opt(s, "no_action").fits).toBe(false);
    expect(opt(s, "clean_and_recheck").fits).toBe(false);
  });

  it("missing pipe, heavy deformation and large offsets keep lining out", () => {
    expect(opt(onlyStretch(inSoil([{ at: 30, type: "break_or_hole", grade: 5 }])), "lining").fits).toBe(false);
    expect(opt(onlyStretch(inSoil([{ at: 30, type: "break_or_hole", grade: 4 }])), "lining").fits).toBe(true);
    expect(opt(onlyStretch(inSoil([{ at: 30, type: "deformation", grade: 4, lossPct: 12 }])), "lining").fits).toBe(false);
    expect(opt(onlyStretch(inSoil([{ at: 30, type: "deformation", grade: 3, lossPct: 8 }])), "lining").fits).toBe(true);
    expect(opt(onlyStretch(inSoil([{ at: 30, type: "offset_joint", grade: 4 }])), "lining").fits).toBe(false);
    expect(opt(onlyStretch(inSoil([{ at: 30, type: "offset_joint", grade: 3 }])), "lining").fits).toBe(true);
  });

  it("a diameter change needs a transition liner, and the rate table's transition amount is added", () => {
    const segments = [
      { from: 0, to: 30, material: "cast_iron" as const, diameterIn: 4 },
      { from: 30, to: 60, material: "vitrified_clay" as const, diameterIn: 6 },
    ];
    const changed = opt(onlyStretch(inSoil([fracture(30)], 3, { segments })), "lining");
    const same = opt(onlyStretch(inSoil([fracture(30)])), "lining");
    expect(changed.fits).toBe(true);
    expect(changed.reason).toMatch(/from 4 in to 6 in here: it needs a transition liner/);
    expect(same.reason).not.toMatch(/transition/);
    // 4 ft of lining: $1,000 + $100 x 4 = $1,400 low, $2,000 + $200 x 4 = $2,800 high; transition $300-$600
    expect([same.costLowCents, same.costHighCents]).toEqual([140_000, 280_000]);
    expect([changed.costLowCents, changed.costHighCents]).toEqual([170_000, 340_000]);
    expect(changed.liner?.diameterIn).toBe(6);
  });

  it("the driveway fixture's cast iron to clay transition gets a transition liner, favoured under the concrete", () => {
    const e = evaluate(driveway, { rates: FLAT_RATES });
    const lining = opt(e.stretches[0], "lining");
    expect(lining.fits).toBe(true);
    expect(lining.reason).toMatch(/transition liner/);
    expect(lining.favoured).toBe(true);
  });

  it("roots are cut before any lining, and the cleaning is priced into it", () => {
    const withRoots = opt(onlyStretch(inSoil([fracture(30), { at: 31, type: "roots", grade: 2 }])), "lining");
    expect(withRoots.reason).toMatch(/roots are cut out first/);
    // lining $1,400-$2,800 plus cleaning $200-$400
    expect([withRoots.costLowCents, withRoots.costHighCents]).toEqual([160_000, 320_000]);
  });

  it("work under hardscape or a street favours trenchless methods; in a lawn nothing is favoured", () => {
    for (const surface of ["hardscape", "street"] as const) {
      const s = onlyStretch(withFindings([fracture(30)], { boundaryAt: null, locates: marksAt(3, surface) }));
      expect(opt(s, "lining").favoured).toBe(true);
      expect(opt(s, "pipe_bursting").favoured).toBe(true);
      expect(opt(s, "excavate_replace").favoured).toBe(false);
      expect(opt(s, "excavate_replace").reason).toMatch(/trenchless method is favoured/);
      expect(["lining", "pipe_bursting"]).toContain(s.suggested);
    }
    const soil = onlyStretch(inSoil([fracture(30)]));
    expect(soil.options.some((o) => o.favoured)).toBe(false);
    // in a lawn the cheapest fitting method is suggested: spot repair $800 + $150 x 4 = $1,400 mid $2,100
    expect(soil.suggested).toBe("spot_repair");
  });

  it("costs follow the rate table, adjusted for depth and surface", () => {
    const cost = (depth: number, surface: "soil" | "street") => {
      const s = onlyStretch(withFindings([fracture(30)], { boundaryAt: null, locates: marksAt(depth, surface) }));
      const o = opt(s, "excavate_replace");
      return [o.costLowCents, o.costHighCents];
    };
    // 4 ft at $1,000 + $100/ft .. $2,000 + $200/ft
    expect(cost(3, "soil")).toEqual([140_000, 280_000]);
    // deeper than 5 ft: excavation x 2
    expect(cost(6, "soil")).toEqual([280_000, 560_000]);
    // in the street: x 2 and $1,000-$2,000 of restoration
    expect(cost(3, "street")).toEqual([380_000, 760_000]);
  });

  it("a spot repair covers 10 ft at most", () => {
    const s = onlyStretch(inSoil([{ at: 20, to: 34, type: "sag", grade: 3, waterDepthPct: 10 }]));
    expect(s.length).toBe(18);
    expect(opt(s, "spot_repair").fits).toBe(false);
    expect(opt(s, "spot_repair").reason).toMatch(/10 ft at most/);
  });

  it("no action fits a stretch whose worst is grade 3, not one with worse", () => {
    expect(opt(onlyStretch(inSoil([{ at: 30, type: "offset_joint", grade: 3 }])), "no_action")).toMatchObject({
      fits: true,
      costLowCents: 0,
      costHighCents: 0,
    });
    expect(opt(onlyStretch(inSoil([fracture(30)])), "no_action").fits).toBe(false);
  });

  it("cleaning and a re-check fits where only roots or deposits need work, and is then suggested", () => {
    const roots = onlyStretch(inSoil([{ at: 30, type: "roots", grade: 4, lossPct: 50 }]));
    expect(opt(roots, "clean_and_recheck").fits).toBe(true);
    expect(opt(roots, "clean_and_recheck").reason).toMatch(/^Cut the roots/);
    expect(roots.suggested).toBe("clean_and_recheck");
    const cracked = onlyStretch(inSoil([{ at: 30, type: "roots", grade: 4 }, fracture(31)]));
    expect(opt(cracked, "clean_and_recheck").fits).toBe(false);
  });

  it("a camera that could not get past a stretch keeps trenchless methods out until it is cleared and seen", () => {
    const record = withFindings([{ at: 39, type: "roots", grade: 4, lossPct: 90 }], {
      segments: [{ from: 0, to: 40, material: "vitrified_clay", diameterIn: 4 }],
      surveyEnd: { at: 40, reason: "could_not_pass" },
      boundaryAt: null,
      locates: marksAt(3, "soil").filter((m) => m.at <= 40),
    });
    const s = onlyStretch(record);
    expect(opt(s, "lining").fits).toBe(false);
    expect(opt(s, "lining").reason).toMatch(/could not get past 40 ft/);
    expect(opt(s, "pipe_bursting").fits).toBe(false);
  });

  it("no lining standard covers pipe under 3 in", () => {
    const s = onlyStretch(inSoil([fracture(30)], 3, { segments: [{ from: 0, to: 60, material: "pvc", diameterIn: 2 }] }));
    expect(opt(s, "lining").fits).toBe(false);
    expect(opt(s, "lining").reason).toMatch(/^No lining standard covers 2-in pipe/);
  });
});

describe("the lining option states the liner wall (published: ASTM F1216 Appendix X1)", () => {
  it("for the stretch's diameter, groundwater at its depth and the measured ovality", () => {
    const s = onlyStretch(inSoil([{ at: 30, type: "deformation", grade: 3, lossPct: 8 }], 3));
    const lining = opt(s, "lining");
    expect(lining.liner).toEqual(linerWall(4, 3, 8));
    expect(lining.liner?.ovalityPct).toBe(8);
    expect(lining.reason).toMatch(/ASTM F1216 Appendix X1/);
    expect(lining.reason).toContain(`${Math.round((lining.liner?.designIn ?? 0) * 1000) / 1000} in`);
  });

  it("practice: assumes 2 % ovality where no deformation was measured", () => {
    const s = onlyStretch(inSoil([fracture(30)], 3));
    expect(opt(s, "lining").liner?.ovalityPct).toBe(2);
  });

  it("non-lining options carry no liner", () => {
    const s = onlyStretch(inSoil([fracture(30)]));
    expect(s.options.filter((o) => o.method !== "lining").every((o) => o.liner === null)).toBe(true);
  });
});

describe("costs split by side", () => {
  it("adds the suggested method of every stretch to its side", () => {
    const e = evaluate(withFindings([fracture(20), fracture(55)], { locates: marksAt(3, "soil") }), { rates: FLAT_RATES });
    expect(e.stretches.map((s) => s.side)).toEqual(["private", "public"]);
    const priced = (s: Stretch) => opt(s, s.suggested ?? "no_action");
    expect(e.costBySide.private).toEqual({
      lowCents: priced(e.stretches[0]).costLowCents,
      highCents: priced(e.stretches[0]).costHighCents,
    });
    expect(e.costBySide.public).toEqual({ lowCents: priced(e.stretches[1]).costLowCents, highCents: priced(e.stretches[1]).costHighCents });
  });

  it("is zero on both sides for a sound line", () => {
    const e = evaluate(plainLine());
    expect(e.stretches).toEqual([]);
    expect(e.costBySide).toEqual({ private: { lowCents: 0, highCents: 0 }, public: { lowCents: 0, highCents: 0 } });
  });
});
