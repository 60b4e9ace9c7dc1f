import { describe, expect, it } from "vitest";

import { CLAY_LATERAL_1950S, evaluate, PVC_LATERAL_1990S, type RecordInput } from "@/lib/engine";
import { renderReportPdf } from "@/lib/pdf/report-pdf";
import type { ReportRecord, ReportSummary } from "@/lib/reports/dto";

import { pdfText } from "../utils/pdf-text";

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
