import "server-only";

import PDFDocument from "pdfkit";

import { DISCLAIMER, methodLines, observedLine } from "@/components/report/report-text";
import { formatAddress } from "@/lib/format";
import type { ReportSummary } from "@/lib/reports/dto";

import { cautionsSection, findingsTable, repairSection } from "./detail-blocks";
import { DIAGRAM_HEIGHT, drawLineDiagram } from "./diagram";
import { FONT, INK_2, RULE, safe } from "./style";
import { header, keyFigures, severityBlock } from "./summary-blocks";
import { MARGIN, Writer, type Doc } from "./writer";

function paragraphs(text: string) {
  return text
    .split(/\n\s*\n/)
    .map((p) => p.trim())
    .filter(Boolean);
}

function footers(doc: Doc, s: ReportSummary) {
  const range = doc.bufferedPageRange();
  const label = safe(`Gradeline rated summary  ·  ${formatAddress(s.address)}  ·  ${observedLine(s)}`);
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    const y = doc.page.height - MARGIN - 10;
    doc
      .moveTo(MARGIN, y - 6)
      .lineTo(doc.page.width - MARGIN, y - 6)
      .lineWidth(0.5)
      .stroke(RULE);
    doc
      .font(FONT.body)
      .fontSize(7.5)
      .fillColor(INK_2)
      .text(label, MARGIN, y, { width: doc.page.width - MARGIN * 2 - 60, lineBreak: false, ellipsis: true });
    doc.text(`Page ${i + 1} of ${range.count}`, doc.page.width - MARGIN - 60, y, { width: 60, align: "right", lineBreak: false });
    doc.page.margins.bottom = bottom;
  }
}

/** The rated summary as a PDF: the same content as the page, diagram included, in the standard PDF fonts. */
export function renderReportPdf(summary: ReportSummary): Promise<Buffer> {
  const doc = new PDFDocument({
    size: "LETTER",
    margins: { top: MARGIN, bottom: MARGIN, left: MARGIN, right: MARGIN },
    bufferPages: true,
    lang: "en-US",
    displayTitle: true,
    info: {
      Title: safe(`Rated summary: ${formatAddress(summary.address)}`),
      Author: "Gradeline",
      Subject: "Sewer scope rated summary",
      Creator: "Gradeline",
    },
  });
  const done = new Promise<Buffer>((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on("data", (c: Buffer) => chunks.push(c));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });

  const w = new Writer(doc);
  const e = summary.evaluation;
  header(w, summary);
  severityBlock(w, summary);
  keyFigures(w, summary);

  w.heading("In short");
  for (const b of e.summary) w.bullet(b);

  if (summary.narrative.trim() || summary.recommendation.trim()) {
    w.heading("The inspector's notes");
    if (summary.narrative.trim()) {
      w.subheading("What they saw");
      for (const p of paragraphs(summary.narrative)) w.para(p);
    }
    if (summary.recommendation.trim()) {
      w.subheading("What they recommend");
      for (const p of paragraphs(summary.recommendation)) w.para(p);
    }
  }

  w.heading("Side view of the line");
  w.para(
    "Footage runs from the access point (0 ft) towards the main. Depths come from the locate marks; all footages and depths are approximate.",
    {
      size: 8.5,
      colour: INK_2,
    },
  );
  w.ensure(DIAGRAM_HEIGHT);
  const dy = doc.y;
  drawLineDiagram(doc, summary.record, e, MARGIN, dy, w.width);
  doc.y = dy + DIAGRAM_HEIGHT;
  doc.x = MARGIN;

  w.heading("Findings, worst first");
  findingsTable(w, summary);
  repairSection(w, summary);
  cautionsSection(w, summary);

  w.heading("How this summary was made");
  for (const l of methodLines(summary)) w.para(l, { size: 8.5, colour: INK_2 });
  w.para(`${observedLine(summary)}.`, { size: 9, font: FONT.bold });
  for (const d of DISCLAIMER) w.para(d, { size: 9 });

  footers(doc, summary);
  doc.end();
  return done;
}
