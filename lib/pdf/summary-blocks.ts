import "server-only";

import { ftNumber, observedLine, rangeText, severityMeaning } from "@/components/report/report-text";
import { SEVERITY_LABELS } from "@/lib/engine";
import type { ReportSummary } from "@/lib/reports/dto";

import { FONT, INK, INK_2, RULE, safe, sevColour, TEAL } from "./style";
import { MARGIN, type Writer } from "./writer";

// The top of the PDF: address, severity rating with its meaning, key figures.

export function header(w: Writer, s: ReportSummary) {
  const { doc } = w;
  doc.font(FONT.bold).fontSize(8).fillColor(TEAL).text("GRADELINE  ·  RATED SUMMARY", MARGIN, MARGIN, { characterSpacing: 1 });
  w.gap(6);
  const street = `${s.address.street}${s.address.unit ? `, ${s.address.unit}` : ""}`;
  doc.font(FONT.heading).fontSize(22).fillColor(INK).text(safe(street), MARGIN, doc.y, { width: w.width });
  doc
    .font(FONT.body)
    .fontSize(11)
    .fillColor(INK_2)
    .text(safe(`${s.address.city}, ${s.address.state} ${s.address.postalCode}`));
  w.gap(4);
  const who = s.inspector
    ? `Inspector: ${s.inspector.name}${s.inspector.company ? `, ${s.inspector.company}` : ""}${s.inspector.licenceNumber ? ` · licence ${s.inspector.licenceNumber}` : ""}`
    : null;
  doc
    .font(FONT.body)
    .fontSize(9)
    .fillColor(INK_2)
    .text(safe([observedLine(s), who].filter(Boolean).join("  ·  ")), { width: w.width });
  w.gap(10);
}

export function severityBlock(w: Writer, s: ReportSummary) {
  const { doc } = w;
  const e = s.evaluation;
  const c = sevColour(e.severity);
  const textX = MARGIN + 96;
  const textW = w.width - 96 - 14;
  const meaning = safe(severityMeaning(e));
  const why = e.severityReasons.length ? safe(`Why this rating: ${e.severityReasons.join("; ")}.`) : "";
  doc.font(FONT.heading).fontSize(12.5);
  const hMeaning = doc.heightOfString(meaning, { width: textW, lineGap: 1.5 });
  doc.font(FONT.body).fontSize(8.5);
  const hWhy = why ? doc.heightOfString(why, { width: textW }) : 0;
  const boxH = Math.max(86, 30 + hMeaning + hWhy + 18);
  w.ensure(boxH + 40);
  const y = doc.y;
  doc.roundedRect(MARGIN, y, w.width, boxH, 4).fill(c.bg);
  doc.roundedRect(MARGIN, y, 84, boxH, 4).fill(c.fg);
  doc
    .font(FONT.bold)
    .fontSize(34)
    .fillColor("#ffffff")
    .text(String(e.severity), MARGIN, y + boxH / 2 - 28, { width: 84, align: "center" });
  doc
    .font(FONT.bold)
    .fontSize(11)
    .text(e.severityLabel, MARGIN, y + boxH / 2 + 10, { width: 84, align: "center" });
  doc
    .font(FONT.bold)
    .fontSize(9)
    .fillColor(c.fg)
    .text(`SEVERITY RATING  ${e.severity} OF 5, ${e.severityLabel.toUpperCase()}`, textX, y + 12, { width: textW, characterSpacing: 0.5 });
  doc
    .font(FONT.heading)
    .fontSize(12.5)
    .fillColor(INK)
    .text(meaning, textX, doc.y + 4, { width: textW, lineGap: 1.5 });
  if (why)
    doc
      .font(FONT.body)
      .fontSize(8.5)
      .fillColor(INK_2)
      .text(why, textX, doc.y + 5, { width: textW });
  doc.y = y + boxH + 8;

  // The scale, with this line's step outlined.
  const stepW = (w.width - 4 * 4) / 5;
  const sy = doc.y;
  for (const g of [1, 2, 3, 4, 5] as const) {
    const x = MARGIN + (g - 1) * (stepW + 4);
    const sc = sevColour(g);
    doc.roundedRect(x, sy, stepW, 20, 2).fill(sc.bg);
    doc.rect(x, sy, stepW, 3).fill(sc.fg);
    if (g === e.severity)
      doc
        .roundedRect(x - 1, sy - 1, stepW + 2, 22, 2)
        .lineWidth(1.4)
        .stroke(INK);
    doc
      .font(FONT.bold)
      .fontSize(8)
      .fillColor(sc.fg)
      .text(`${g}  ${SEVERITY_LABELS[g]}`, x + 6, sy + 8, { width: stepW - 8, lineBreak: false });
  }
  doc.y = sy + 30;
}

export function keyFigures(w: Writer, s: ReportSummary) {
  const { doc } = w;
  const e = s.evaluation;
  const items: [string, string][] = [
    [
      "Line surveyed",
      `${ftNumber(e.lengths.surveyed)} ft${e.lengths.public > 0 ? ` (${ftNumber(e.lengths.private)} owner's, ${ftNumber(e.lengths.public)} city's)` : ""}`,
    ],
    ["Findings", `${e.findings.length}; ${e.stretches.length} ${e.stretches.length === 1 ? "stretch needs" : "stretches need"} work`],
    ["Estimate, owner's side", e.costBySide.private.highCents > 0 ? rangeText(e.costBySide.private) : "No repair work"],
    ["Estimate, city's side", e.costBySide.public.highCents > 0 ? rangeText(e.costBySide.public) : "No repair work"],
  ];
  const colW = w.width / items.length;
  w.ensure(40);
  const y = doc.y;
  items.forEach(([label, value], i) => {
    const x = MARGIN + i * colW;
    doc
      .moveTo(x, y)
      .lineTo(x + colW - 8, y)
      .lineWidth(0.6)
      .stroke(RULE);
    doc
      .font(FONT.bold)
      .fontSize(7)
      .fillColor(INK_2)
      .text(label.toUpperCase(), x, y + 4, { width: colW - 8, characterSpacing: 0.4 });
    doc
      .font(FONT.body)
      .fontSize(9.5)
      .fillColor(INK)
      .text(safe(value), x, doc.y + 2, { width: colW - 8 });
  });
  doc.y = y + 42;
  doc.x = MARGIN;
}
