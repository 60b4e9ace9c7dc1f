import { describe, expect, it } from "vitest";

import { CLAY_LATERAL_1950S, evaluate } from "../../lib/engine";
import { marksAt, plainLine, withFindings } from "./fixtures/records";

describe("summary bullets", () => {
  const clay = evaluate(CLAY_LATERAL_1950S);

  it("open with the severity rating and the reason for it", () => {
    expect(clay.summary[0]).toBe("Severity 4 of 5, Serious: the worst finding is the fracture (grade 4) at 44 ft.");
  });

  it("say how far the camera went, from where, and where the public side begins", () => {
    expect(clay.summary).toContain("The camera went 74 ft from the cleanout inside the house and reached the main.");
    expect(clay.summary).toContain(
      "The first 58 ft are the owner's (private side); the last 16 ft, from 58 ft, are the city's or utility's (public side).",
    );
  });

  it("group findings of a kind, with their footages and side", () => {
    expect(clay.summary).toContain("4 root intrusions from 16.5 ft to 47.5 ft (private side), worst grade 3 of 5.");
    expect(clay.summary).toContain("Offset joint at 63 ft (public side), grade 3 of 5.");
  });

  it("give a sag's standing water and the share of the pipe it fills", () => {
    expect(clay.summary).toContain(
      "A sag from 34 ft to 42 ft (private side) holds water 30 % of the pipe's height, filling about 25 % of its cross-section.",
    );
  });

  it("name each stretch that needs work, its side, the suggested repair with its price, and what is ruled out", () => {
    const stretch = clay.summary.find((b) => b.startsWith("17.5-46 ft (private side) needs work"));
    expect(stretch).toMatch(/Suggested: Dig up and replace, about \$[\d,]+-\$[\d,]+\./);
    expect(stretch).toMatch(/Ruled out here: .*lining/);
    expect(clay.summary.at(-1)).toMatch(
      /^Private side estimate \$[\d,]+-\$[\d,]+; public side estimate \$[\d,]+-\$[\d,]+ \(the city's or utility's to decide\)\.$/,
    );
  });

  it("flag a grade below the code's minimum as an estimate", () => {
    const flat = evaluate(
      plainLine({
        locates: [
          { at: 10, depthFt: 3, groundElevationFt: null, surface: "soil" },
          { at: 50, depthFt: 3.2, groundElevationFt: null, surface: "soil" },
        ],
      }),
    );
    expect(flat.summary).toContain(
      "Between the marks at 10 ft and 50 ft (private side) the line falls about 0.06 in per ft, less than the 1/8 in per ft the International Plumbing Code asks of 4-in pipe (an estimate from locator depths).",
    );
  });

  it("say plainly when nothing needs work", () => {
    expect(evaluate(plainLine()).summary.at(-1)).toBe("No defects were recorded.");
    expect(evaluate(withFindings([{ at: 5, type: "crack", grade: 2 }], { locates: marksAt(3, "soil") })).summary.at(-1)).toBe(
      "No stretch needs repair now; the minor findings are worth watching.",
    );
  });
});
