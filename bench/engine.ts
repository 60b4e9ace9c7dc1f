// Rating and repair engine benchmark: a 300 ft line with 200 findings, evaluated many times.
// Run: npx tsx bench/engine.ts [rounds]. Target: under 5 ms per evaluation (quality target P7).
import fs from "node:fs";
import { performance } from "node:perf_hooks";

import { evaluate, FINDING_TYPE_IDS, type RecordInput } from "../lib/engine";

// A fixed-seed generator, so every run measures the same line.
function lcg(seed: number) {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

function bigLine(): RecordInput {
  const rnd = lcg(20260115);
  const findings: RecordInput["findings"] = [];
  for (let i = 0; i < 200; i++) {
    const type = FINDING_TYPE_IDS[Math.floor(rnd() * FINDING_TYPE_IDS.length)];
    const at = Math.round(rnd() * 2950) / 10;
    const continuous = rnd() < 0.2;
    findings.push({
      at,
      to: continuous ? Math.min(300, Math.round((at + 1 + rnd() * 12) * 10) / 10) : null,
      type,
      grade: 1 + Math.floor(Math.pow(rnd(), 1.8) * 5),
      clock: rnd() < 0.5 ? "3-9" : null,
      lossPct: type === "roots" || type === "deposits" ? Math.round(rnd() * 60) : null,
      waterDepthPct: type === "sag" ? Math.round(rnd() * 50) : null,
      note: "bench",
    });
  }
  return {
    access: { kind: "cleanout_inside" },
    segments: [
      { from: 0, to: 12, material: "cast_iron", diameterIn: 4 },
      { from: 12, to: 80, material: "vitrified_clay", diameterIn: 4 },
      { from: 80, to: 96, material: "pvc", diameterIn: 4 },
      { from: 96, to: 220, material: "vitrified_clay", diameterIn: 6 },
      { from: 220, to: 300, material: "concrete", diameterIn: 8 },
    ],
    surveyEnd: { at: 300, reason: "reached_main" },
    boundaryAt: 262,
    locates: Array.from({ length: 16 }, (_, i) => ({
      at: i * 20,
      depthFt: 2 + i * 0.45,
      groundElevationFt: i % 3 === 0 ? 100 - i * 0.2 : null,
      surface: (["soil", "hardscape", "soil", "street"] as const)[i % 4],
    })),
    findings,
  };
}

function timePerCall(fn: () => unknown, minMs: number): number {
  let n = 0;
  const start = performance.now();
  let now = start;
  while (now - start < minMs) {
    for (let i = 0; i < 20; i++) fn();
    n += 20;
    now = performance.now();
  }
  return (now - start) / n;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

const record = bigLine();
const json = JSON.stringify(record);
const rounds = Number(process.argv[2] ?? 7);

const first = evaluate(record);
let sink = 0;
for (let i = 0; i < 200; i++) sink += evaluate(record).severity + (JSON.parse(json) as RecordInput).findings.length;

const evalMs: number[] = [];
const evalWithParseMs: number[] = [];
const parseMs: number[] = [];
for (let r = 0; r < rounds; r++) {
  evalMs.push(timePerCall(() => (sink += evaluate(record).severity), 400));
  parseMs.push(timePerCall(() => (sink += (JSON.parse(json) as RecordInput).findings.length), 400));
  evalWithParseMs.push(timePerCall(() => (sink += evaluate(JSON.parse(json)).severity), 400));
}

const e = median(evalMs);
const p = median(parseMs);
const ep = median(evalWithParseMs);
console.log(
  `record: ${record.surveyEnd.at} ft, ${record.findings.length} findings, ${record.locates.length} locate marks, ${json.length} bytes of JSON`,
);
console.log(
  `result: severity ${first.severity} (${first.severityLabel}), ${first.stretches.length} stretches, ${first.summary.length} summary bullets`,
);
console.log(
  `evaluate:              ${e.toFixed(3)} ms per evaluation (median of ${rounds} rounds; min ${Math.min(...evalMs).toFixed(3)}, max ${Math.max(...evalMs).toFixed(3)})`,
);
console.log(`JSON.parse:            ${(p * 1000).toFixed(1)} us per parse`);
console.log(`JSON.parse + evaluate: ${ep.toFixed(3)} ms`);
console.log(`ratio evaluate / JSON.parse: ${(e / p).toFixed(1)}x`);
console.log(`target < 5 ms: ${e < 5 ? "met" : "NOT met"}`);
if (sink === -1) console.log(sink);
// bench/run.ts reads the figures from here.
if (process.env.BENCH_RESULT_FILE) fs.writeFileSync(process.env.BENCH_RESULT_FILE, JSON.stringify({ evaluateMs: e, parseMs: p }));
