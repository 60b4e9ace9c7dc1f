import fc from "fast-check";
import { describe, expect, it } from "vitest";

import { evaluate, parseRecord, tryEvaluate, type RecordInput } from "../../lib/engine";
import { findingOn, validRecord } from "./fixtures/arbitraries";

const RUNS = { numRuns: 200 };

type Breaker = { name: string; path: RegExp; apply: (r: RecordInput) => RecordInput };

// Each breaker turns a valid record into one the engine must refuse.
const breakers: Breaker[] = [
  {
    name: "grade 6",
    path: /^findings\[\d+\]\.grade$/,
    apply: (r) => ({ ...r, findings: [...r.findings, { at: 0, type: "crack", grade: 6 }] }),
  },
  {
    name: "finding past the end",
    path: /^findings\[\d+\]\.at$/,
    apply: (r) => ({ ...r, findings: [...r.findings, { at: r.surveyEnd.at + 1, type: "crack", grade: 2 }] }),
  },
  {
    name: "negative depth",
    path: /^locates\[\d+\]\.depthFt$/,
    apply: (r) => ({ ...r, locates: [...r.locates, { at: 0.05, depthFt: -1, surface: "soil" }] }),
  },
  {
    name: "gap in the segments",
    path: /^segments\[\d+\]\.(from|to)$/,
    apply: (r) => {
      const last = r.segments[r.segments.length - 1];
      return { ...r, segments: [...r.segments.slice(0, -1), { ...last, from: last.from + 0.05 }] };
    },
  },
  {
    name: "overlap in the segments",
    path: /^segments\[\d+\]\.from$/,
    apply: (r) => ({ ...r, segments: [...r.segments, { from: r.surveyEnd.at - 0.1, to: r.surveyEnd.at, material: "pvc", diameterIn: 4 }] }),
  },
];

describe("properties", () => {
  it("a valid record always evaluates", () => {
    fc.assert(
      fc.property(validRecord, (record) => {
        const r = tryEvaluate(record);
        if (!r.ok) throw new Error(JSON.stringify(r.problems));
        expect(r.evaluation.severity).toBeGreaterThanOrEqual(1);
        expect(r.evaluation.severity).toBeLessThanOrEqual(5);
      }),
      RUNS,
    );
  });

  it("an invalid record never does, and the problem names its path", () => {
    fc.assert(
      fc.property(validRecord, fc.constantFrom(...breakers), (record, breaker) => {
        const r = tryEvaluate(breaker.apply(record));
        expect(r.ok).toBe(false);
        if (r.ok) return;
        expect(r.problems.some((p) => breaker.path.test(p.path))).toBe(true);
        expect(() => evaluate(breaker.apply(record))).toThrow();
      }),
      RUNS,
    );
  });

  it("private + public = surveyed", () => {
    fc.assert(
      fc.property(validRecord, (record) => {
        const { lengths } = evaluate(record);
        expect(lengths.private + lengths.public).toBeCloseTo(lengths.surveyed, 9);
        expect(lengths.private).toBeGreaterThanOrEqual(0);
        expect(lengths.public).toBeGreaterThanOrEqual(0);
        const byMaterial = lengths.byMaterial.reduce((sum, m) => sum + m.length, 0);
        expect(byMaterial).toBeCloseTo(lengths.surveyed, 9);
      }),
      RUNS,
    );
  });

  it("adding a finding, of any kind, never lowers the severity", () => {
    const recordAndExtra = validRecord.chain((record) => fc.tuple(fc.constant(record), findingOn(record.surveyEnd.at)));
    fc.assert(
      fc.property(recordAndExtra, ([record, extra]) => {
        const before = evaluate(record).severity;
        const after = evaluate({ ...record, findings: [...record.findings, extra] }).severity;
        expect(after).toBeGreaterThanOrEqual(before);
      }),
      RUNS,
    );
  });

  it("making a finding worse never lowers the severity", () => {
    const pick = validRecord
      .filter((r) => r.findings.length > 0)
      .chain((r) => fc.tuple(fc.constant(r), fc.nat({ max: r.findings.length - 1 })));
    fc.assert(
      fc.property(pick, ([record, i]) => {
        const worse = record.findings.map((f, j) => (j === i ? { ...f, grade: Math.min(5, f.grade + 1) } : f));
        expect(evaluate({ ...record, findings: worse }).severity).toBeGreaterThanOrEqual(evaluate(record).severity);
      }),
      RUNS,
    );
  });

  it("stretches lie inside the survey, on one side of the boundary, and never overlap", () => {
    fc.assert(
      fc.property(validRecord, (record) => {
        const parsed = parseRecord(record);
        if (!parsed.ok) throw new Error("generator made a bad record");
        const { boundaryAt, surveyEnd } = parsed.record;
        const { stretches } = evaluate(record);
        stretches.forEach((s, i) => {
          expect(s.from).toBeGreaterThanOrEqual(0);
          expect(s.to).toBeLessThanOrEqual(surveyEnd.at + 1e-9);
          if (boundaryAt !== null) expect(s.side === "public" ? s.from >= boundaryAt : s.to <= boundaryAt).toBe(true);
          if (i > 0) expect(s.from).toBeGreaterThanOrEqual(stretches[i - 1].to);
        });
      }),
      RUNS,
    );
  });
});
