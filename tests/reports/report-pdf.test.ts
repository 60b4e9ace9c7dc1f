import { inflateSync } from "node:zlib";

import { describe, expect, it } from "vitest";

import { CLAY_LATERAL_1950S, evaluate, PVC_LATERAL_1990S, type RecordInput } from "@/lib/engine";
import { renderReportPdf } from "@/lib/pdf/report-pdf";
import type { ReportRecord, ReportSummary } from "@/lib/reports/dto";

function summaryOf(record: RecordInput): ReportSummary {
  const evaluation = evaluate(record);
  return {
    id: "00000000-0000-4000-8000-000000000042",
    locked: false,
    address: { street: "42 Sluice Gate Way", unit: null, city: "Harrow Falls", state: "OR", postalCode: "97000" },
    visitedOn: "2026-03-10",
    deliveredAt: "2026-03-11T09:00:00.000Z",
    timeZone: "America/Los_Angeles",
    inspector: { name: "Wren Okafor", company: "Okafor Drain Cameras", licenceNumber: "HF-SS-1187" },
    clipCount: 0,
    surveyedFt: evaluation.lengths.surveyed,
    priceCents: 32500,
    unlockIncludes: [],
    payment: { status: "paid", createdAt: "2026-03-12T10:00:00.000Z" },
    record: record as ReportRecord,
    evaluation,
    narrative: "Roots at several clay joints and a fracture just past the sag.",
    recommendation: "Get bids for replacing the sag and fracture stretch.",
    clips: [],
    stills: {},
    engineVersion: evaluation.engineVersion,
    observedOn: "2026-03-10",
  };
}

// The standard fonts' WinAnsi bytes that differ from Latin-1, for the characters our wording uses.
const WIN_ANSI: Record<number, string> = {
  0x85: "\u2026",
  0x91: "\u2018",
  0x92: "\u2019",
  0x93: "\u201c",
  0x94: "\u201d",
  0x95: "\u2022",
  0x96: "\u2013",
  0x97: "\u2014",
};
const winAnsi = (hex: string) => [...Buffer.from(hex, "hex")].map((b) => WIN_ANSI[b] ?? String.fromCharCode(b)).join("");

/** The text shown on the pages: every content stream inflated, every TJ/Tj string decoded and joined. */
function pdfText(pdf: Buffer): string {
  const raw = pdf.toString("latin1");
  const parts: string[] = [];
  for (const m of raw.matchAll(/stream\r?\n([\s\S]*?)\r?\nendstream/g)) {
    const bytes = Buffer.from(m[1], "latin1");
    let body: string;
    try {
      body = inflateSync(bytes).toString("latin1");
    } catch {
      body = m[1];
    }
    for (const op of body.matchAll(/\[(.*?)\]\s*TJ|<([0-9a-fA-F]*)>\s*Tj/g)) {
      const hexes = op[1] !== undefined ? [...op[1].matchAll(/<([0-9a-fA-F]*)>/g)].map((h) => h[1]) : [op[2]];
      parts.push(hexes.map(winAnsi).join(""));
    }
  }
  return parts.join(" ").replace(/\s+/g, " ");
}

describe("renderReportPdf", () => {
  it("makes a PDF of the clay lateral with its rating, a finding's footage, the costs and the disclaimer", async () => {
    const summary = summaryOf(CLAY_LATERAL_1950S);
    const pdf = await renderReportPdf(summary);
    expect(pdf.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    const text = pdfText(pdf);
    expect(summary.evaluation.severityLabel).toBe("Serious");
    expect(text).toContain("SEVERITY RATING 4 OF 5, SERIOUS");
    expect(text).toContain("Fracture");
    expect(text).toContain("44 ft");
    expect(text).toContain("17.5\u201346 ft");
    expect(text).toContain("$7,100\u2013$18,800");
    expect(text).toContain("not a warranty");
    expect(text).toContain("estimates for negotiation, not quotes");
    expect(text).toContain(`engine version ${summary.engineVersion}`);
    expect(text).toContain("gradeline-severity-v1");
    expect(text).toContain("As observed on Mar 10, 2026");
  });

  it("draws the side view with the locate depths and the footage axis", async () => {
    const text = pdfText(await renderReportPdf(summaryOf(CLAY_LATERAL_1950S)));
    for (const depth of ["2.6 ft", "5.4 ft", "6.1 ft"]) expect(text).toContain(depth);
    expect(text).toContain("City's side from 58 ft");
    expect(text).toContain("survey end 74 ft: reached the main");
  });

  it("says there is no repair work for a sound line rather than printing empty costs", async () => {
    const text = pdfText(await renderReportPdf(summaryOf(PVC_LATERAL_1990S)));
    expect(text).toContain("No stretch of this line needs repair work now");
    expect(text).not.toContain("Estimated cost of the repairs");
  });
});
