import "server-only";

import { MATERIAL_LABELS, SEVERITY_LABELS, SURVEY_END_LABELS, type Evaluation, type Material, type SurveyEndReason } from "@/lib/engine";
import type { ReportRecord } from "@/lib/reports/dto";

import { FONT, INK, INK_2, PAPER_2, RULE, safe, sevColour, TEAL } from "./style";

type Doc = PDFKit.PDFDocument;

const MATERIAL_COLOURS: Record<Material, string> = {
  cast_iron: "#4a4f4d",
  vitrified_clay: "#b0673a",
  concrete: "#8c8c84",
  bituminous_fibre: "#3b3026",
  abs: "#2f2f2f",
  pvc: "#8fb3c9",
  ductile_iron: "#5a6260",
  hdpe: "#24435e",
  unknown: "#a9a9a9",
};

const fmt = (v: number) => String(Math.round(v * 10) / 10);

function tickStep(length: number): number {
  if (length <= 40) return 5;
  if (length <= 120) return 10;
  if (length <= 300) return 20;
  return 50;
}

/** Depth at a footage, straight between locate marks and held level past the first and last. */
function depthAt(marks: { at: number; depthFt: number }[], at: number): number | null {
  if (marks.length === 0) return null;
  if (at <= marks[0].at) return marks[0].depthFt;
  for (let i = 1; i < marks.length; i++) {
    const a = marks[i - 1];
    const b = marks[i];
    if (at <= b.at) return a.depthFt + ((b.depthFt - a.depthFt) * (at - a.at)) / (b.at - a.at || 1);
  }
  return marks[marks.length - 1].depthFt;
}

export const DIAGRAM_HEIGHT = 232;

/**
 * The side view of the line drawn with pdfkit's vector calls, from the same data as the page's SVG:
 * ground, the pipe at its located depth coloured by material, locate marks, the public side, findings by grade.
 */
export function drawLineDiagram(doc: Doc, record: ReportRecord, e: Evaluation, x0: number, y0: number, width: number): void {
  const left = x0 + 34;
  const right = x0 + width - 8;
  const end = Math.max(record.surveyEnd?.at ?? e.lengths.surveyed, 1);
  const xOf = (ft: number) => left + (Math.min(Math.max(ft, 0), end) / end) * (right - left);
  const marks = (record.locates ?? []).filter((m) => Number.isFinite(m.at) && Number.isFinite(m.depthFt)).sort((a, b) => a.at - b.at);
  const groundY = y0 + 34;
  const depthBand = 84;
  const maxDepth = Math.max(1, ...marks.map((m) => m.depthFt)) * 1.15;
  const pipeY = (ft: number) => {
    const d = depthAt(marks, ft);
    return d === null ? groundY + depthBand * 0.55 : groundY + (d / maxDepth) * depthBand;
  };
  const axisY = groundY + depthBand + 40;

  doc.save();
  // The public side, shaded, with its boundary.
  const boundary = e.lengths.boundaryAt;
  if (boundary !== null && boundary < end) {
    doc
      .rect(xOf(boundary), y0 + 12, right - xOf(boundary), axisY - y0 - 12)
      .fillOpacity(0.5)
      .fill(PAPER_2)
      .fillOpacity(1);
    doc
      .moveTo(xOf(boundary), y0 + 12)
      .lineTo(xOf(boundary), axisY)
      .dash(3, { space: 3 })
      .lineWidth(0.8)
      .stroke(TEAL)
      .undash();
    doc
      .font(FONT.bold)
      .fontSize(7)
      .fillColor(TEAL)
      .text(safe(`City's side from ${fmt(boundary)} ft`), xOf(boundary) + 3, y0 + 2, { lineBreak: false });
  }

  // Ground.
  doc.moveTo(left, groundY).lineTo(right, groundY).lineWidth(1).stroke(INK_2);
  for (let x = left; x < right; x += 9)
    doc
      .moveTo(x, groundY)
      .lineTo(x - 4, groundY + 4)
      .lineWidth(0.4)
      .stroke(RULE);
  doc
    .font(FONT.body)
    .fontSize(6.5)
    .fillColor(INK_2)
    .text("ground", x0, groundY - 3, { width: 30, align: "right", lineBreak: false });

  // The pipe, one stroke per segment, in steps so it follows the located depths.
  for (const seg of e.lengths.segments) {
    const steps = Math.max(2, Math.ceil((seg.to - seg.from) / 2));
    doc.moveTo(xOf(seg.from), pipeY(seg.from));
    for (let k = 1; k <= steps; k++) {
      const ft = seg.from + ((seg.to - seg.from) * k) / steps;
      doc.lineTo(xOf(ft), pipeY(ft));
    }
    doc
      .lineWidth(seg.diameterIn >= 6 ? 6 : 4.5)
      .lineCap("butt")
      .stroke(MATERIAL_COLOURS[seg.material as Material] ?? MATERIAL_COLOURS.unknown);
  }

  // Locate marks: a mark on the ground, a dashed drop to the pipe, the depth read.
  for (const m of marks) {
    const x = xOf(m.at);
    doc.polygon([x - 3.5, groundY - 8], [x + 3.5, groundY - 8], [x, groundY - 2]).fill(INK);
    doc
      .moveTo(x, groundY)
      .lineTo(x, pipeY(m.at) - 3)
      .dash(1.5, { space: 2 })
      .lineWidth(0.6)
      .stroke(INK_2)
      .undash();
    doc
      .font(FONT.num)
      .fontSize(6.5)
      .fillColor(INK)
      .text(`${fmt(m.depthFt)} ft`, x - 20, groundY - 17, { width: 40, align: "center", lineBreak: false });
  }

  // Findings: a bar along continuous ones, and a numbered grade marker in lanes so close ones stay readable.
  const lanes: number[] = [];
  const sorted = [...e.findings].sort((a, b) => a.at - b.at);
  for (const f of sorted) {
    const c = sevColour(f.grade);
    const x = xOf(f.at);
    const y = pipeY(f.at);
    if (f.to !== null && f.to > f.at) {
      doc.moveTo(x, y).lineTo(xOf(f.to), pipeY(f.to)).lineWidth(10).lineCap("round").strokeOpacity(0.35).stroke(c.fg).strokeOpacity(1);
    }
    let lane = lanes.findIndex((lastX) => x - lastX >= 13);
    if (lane === -1) {
      lanes.push(x);
      lane = lanes.length - 1;
    } else lanes[lane] = x;
    const my = y + 16 + lane * 14;
    doc
      .moveTo(x, y + 3)
      .lineTo(x, my - 5.5)
      .lineWidth(0.5)
      .stroke(c.fg);
    doc.circle(x, my, 5.5).fill(c.fg);
    doc
      .font(FONT.bold)
      .fontSize(7)
      .fillColor("#ffffff")
      .text(String(f.grade), x - 5.5, my - 2.6, { width: 11, align: "center", lineBreak: false });
  }

  // Footage axis.
  doc.moveTo(left, axisY).lineTo(right, axisY).lineWidth(0.8).stroke(INK);
  const step = tickStep(end);
  for (let ft = 0; ft <= end + 0.001; ft += step) {
    doc
      .moveTo(xOf(ft), axisY)
      .lineTo(xOf(ft), axisY + 3)
      .lineWidth(0.6)
      .stroke(INK);
    doc
      .font(FONT.num)
      .fontSize(6.5)
      .fillColor(INK)
      .text(String(ft), xOf(ft) - 12, axisY + 5, { width: 24, align: "center", lineBreak: false });
  }
  doc
    .font(FONT.body)
    .fontSize(6.5)
    .fillColor(INK_2)
    .text("footage, ft", x0, axisY - 3, { width: 30, align: "right", lineBreak: false });
  const reason = record.surveyEnd?.reason as SurveyEndReason | undefined;
  doc
    .font(FONT.body)
    .fontSize(6.5)
    .fillColor(INK_2)
    .text(
      safe(`survey end ${fmt(end)} ft${reason && SURVEY_END_LABELS[reason] ? `: ${SURVEY_END_LABELS[reason]}` : ""}`),
      right - 160,
      axisY + 14,
      { width: 160, align: "right", lineBreak: false },
    );

  // Pipe band with its materials, under the axis.
  const bandY = axisY + 26;
  for (const seg of e.lengths.segments) {
    const x1 = xOf(seg.from);
    const x2 = xOf(seg.to);
    doc.rect(x1, bandY, Math.max(0.5, x2 - x1), 5).fill(MATERIAL_COLOURS[seg.material as Material] ?? MATERIAL_COLOURS.unknown);
    const text = safe(`${MATERIAL_LABELS[seg.material as Material] ?? seg.material}, ${fmt(seg.diameterIn)} in`);
    doc.font(FONT.body).fontSize(6.5);
    if (doc.widthOfString(text) < x2 - x1 - 2) doc.fillColor(INK).text(text, x1 + 1, bandY + 7, { width: x2 - x1 - 1, lineBreak: false });
  }

  // Legend.
  let lx = left;
  const ly = bandY + 22;
  doc
    .font(FONT.body)
    .fontSize(6.5)
    .fillColor(INK_2)
    .text("Grade", lx, ly - 2.4, { lineBreak: false });
  lx += 24;
  for (const g of [1, 2, 3, 4, 5] as const) {
    doc.circle(lx + 4, ly + 1, 4).fill(sevColour(g).fg);
    doc
      .font(FONT.bold)
      .fontSize(5.5)
      .fillColor("#ffffff")
      .text(String(g), lx, ly - 1.2, { width: 8, align: "center", lineBreak: false });
    doc
      .font(FONT.body)
      .fontSize(6.5)
      .fillColor(INK)
      .text(SEVERITY_LABELS[g], lx + 10, ly - 2.4, { lineBreak: false });
    lx += 14 + doc.widthOfString(SEVERITY_LABELS[g]) + 8;
  }
  doc.polygon([lx + 2, ly - 3], [lx + 9, ly - 3], [lx + 5.5, ly + 3]).fill(INK);
  doc
    .font(FONT.body)
    .fontSize(6.5)
    .fillColor(INK)
    .text("locate mark with the depth read", lx + 13, ly - 2.4, { lineBreak: false });
  doc.restore();
}
