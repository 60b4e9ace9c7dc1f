import "server-only";

import {
  clipTime,
  clockText,
  findingsWorstFirst,
  ftNumber,
  ftSpan,
  rangeText,
  SIDE_SHORT,
  SIDE_TEXT,
} from "@/components/report/report-text";
import { CAUTIONS } from "@/components/ui/caution";
import { MATERIAL_LABELS, SEVERITY_LABELS, SURFACE_LABELS, type Stretch } from "@/lib/engine";
import type { ReportSummary } from "@/lib/reports/dto";

import { FONT, INK, INK_2, RULE, safe, sevColour, TEAL, WARNING_BG } from "./style";
import { MARGIN, type Writer } from "./writer";

// The body of the PDF: findings table, repair options per stretch, cautions.

const COLUMNS = [
  { key: "footage", title: "Footage", width: 58 },
  { key: "finding", title: "Finding", width: 100 },
  { key: "side", title: "Side", width: 62 },
  { key: "clock", title: "Clock", width: 62 },
  { key: "grade", title: "Grade", width: 62 },
  { key: "note", title: "Note", width: 0 },
] as const;

export function findingsTable(w: Writer, s: ReportSummary) {
  const { doc } = w;
  const fixed = COLUMNS.reduce((sum, c) => sum + c.width, 0);
  const widths = COLUMNS.map((c) => (c.width === 0 ? w.width - fixed : c.width));
  const pad = 4;
  const head = () => {
    const y = doc.y;
    let x = MARGIN;
    doc.rect(MARGIN, y, w.width, 16).fill("#f1eee6");
    COLUMNS.forEach((c, i) => {
      doc
        .font(FONT.bold)
        .fontSize(7.5)
        .fillColor(INK_2)
        .text(c.title.toUpperCase(), x + pad, y + 5, { width: widths[i] - pad * 2, lineBreak: false });
      x += widths[i];
    });
    doc.y = y + 18;
  };
  const rows = findingsWorstFirst(s);
  if (rows.length === 0) {
    w.para("The inspector recorded no findings on this line.", { colour: INK_2 });
    return;
  }
  w.ensure(50);
  head();
  for (const f of rows) {
    const note = [f.measure, f.note, f.clip ? `Seen in clip "${f.clip.label}" at ${clipTime(f.clipSecond)}` : null]
      .filter(Boolean)
      .join(". ");
    const cells = [ftSpan(f.at, f.to), f.label, SIDE_SHORT[f.side], clockText(f.clock) ?? "-", "", note || "-"].map(safe);
    doc.font(FONT.body).fontSize(8.5);
    const h = Math.max(16, ...cells.map((t, i) => doc.heightOfString(t, { width: widths[i] - pad * 2 }) + pad * 2));
    if (doc.y + h > w.bottom) {
      doc.addPage();
      head();
    }
    const y = doc.y;
    let x = MARGIN;
    cells.forEach((t, i) => {
      if (COLUMNS[i].key === "grade") {
        const c = sevColour(f.grade);
        doc.roundedRect(x + pad, y + pad - 1, 12, 11, 2).fill(c.fg);
        doc
          .font(FONT.bold)
          .fontSize(8)
          .fillColor("#ffffff")
          .text(String(f.grade), x + pad, y + pad + 1, { width: 12, align: "center", lineBreak: false });
        doc
          .font(FONT.body)
          .fontSize(8.5)
          .fillColor(c.fg)
          .text(SEVERITY_LABELS[f.grade as 1 | 2 | 3 | 4 | 5] ?? "", x + pad + 16, y + pad, {
            width: widths[i] - pad * 2 - 16,
            lineBreak: false,
          });
      } else {
        doc
          .font(COLUMNS[i].key === "footage" ? FONT.num : FONT.body)
          .fontSize(8.5)
          .fillColor(INK)
          .text(t, x + pad, y + pad, { width: widths[i] - pad * 2 });
      }
      x += widths[i];
    });
    doc
      .moveTo(MARGIN, y + h)
      .lineTo(MARGIN + w.width, y + h)
      .lineWidth(0.4)
      .stroke(RULE);
    doc.y = y + h;
    doc.x = MARGIN;
  }
  w.gap(6);
}

const capitalise = (t: string) => t.charAt(0).toUpperCase() + t.slice(1);

function stretchBlock(w: Writer, s: Stretch) {
  const pipe = `${s.diametersIn.map((d) => `${ftNumber(d)}-in`).join(" and ")} ${s.materials.map((m) => MATERIAL_LABELS[m]).join(" and ")}`;
  w.subheading(`${ftSpan(s.from, s.to)}  ·  ${SIDE_TEXT[s.side]}`);
  w.para(
    `Needs work for ${s.why}. The pipe here is ${pipe}, about ${ftNumber(s.depthFt)} ft deep${s.depthAssumed ? " (assumed: no locate mark here)" : ""} under ${SURFACE_LABELS[s.surface]}${s.surfaceAssumed ? " (assumed)" : ""}.`,
    { size: 9, colour: INK_2 },
  );
  if (s.note) w.para(s.note, { size: 9, colour: TEAL });
  for (const o of s.options.filter((x) => x.fits)) {
    const tags = [o.favoured ? "favoured here" : null, o.method === s.suggested ? "used in the estimate" : null].filter(Boolean).join(", ");
    const cost =
      o.costLowCents === null || o.costHighCents === null
        ? ""
        : o.costHighCents === 0
          ? " - No cost now"
          : ` - ${rangeText({ lowCents: o.costLowCents, highCents: o.costHighCents })} (estimate, ${SIDE_SHORT[s.side]})`;
    w.bullet(`${cost ? `${cost.replace(/^ - /, "")}. ` : ""}${tags ? `${capitalise(tags)}. ` : ""}${o.reason}`, {
      size: 9,
      lead: `Fits: ${o.label}.`,
    });
    if (o.liner) {
      w.para(
        `Liner wall: at least ${Math.round(o.liner.designIn * 1000) / 1000} in for this ${ftNumber(o.liner.diameterIn)}-in pipe (ASTM F1216 Appendix X1, groundwater assumed up to the surface, ${Math.round(o.liner.ovalityPct)} % ovality); an installed wall thinner than ${Math.round(o.liner.installedAtLeastIn * 1000) / 1000} in fails a common acceptance check.`,
        { size: 8.5, colour: INK_2, indent: 12 },
      );
    }
  }
  for (const o of s.options.filter((x) => !x.fits)) w.bullet(o.reason, { size: 9, colour: INK_2, lead: `Ruled out: ${o.label}.` });
  w.gap(4);
}

export function repairSection(w: Writer, s: ReportSummary) {
  const e = s.evaluation;
  w.heading("Repair options");
  if (e.stretches.length === 0) {
    w.para("No stretch of this line needs repair work now, so there are no repair options or costs to weigh.");
    return;
  }
  w.para(
    `Every figure is an estimate for negotiation, not a quote, from the rate table "${e.rates.name}" (${e.rates.effectiveDate}); a licensed contractor's written bid decides the real price.`,
    { size: 9, colour: INK_2 },
  );
  for (const st of e.stretches) stretchBlock(w, st);
  const { doc } = w;
  w.ensure(60);
  const y = doc.y;
  const lines = (["private", "public"] as const)
    .filter((side) => e.stretches.some((st) => st.side === side))
    .map(
      (side) => `${SIDE_TEXT[side]}: ${rangeText(e.costBySide[side])}${side === "public" ? " (the city's or utility's to decide)" : ""}`,
    );
  const boxH = 30 + lines.length * 13;
  doc.roundedRect(MARGIN, y, w.width, boxH, 3).fill("#f6e8dc");
  doc
    .font(FONT.bold)
    .fontSize(9.5)
    .fillColor(INK)
    .text("Estimated cost of the repairs used in the estimate", MARGIN + 10, y + 8, { width: w.width - 20 });
  for (const l of lines)
    doc
      .font(FONT.body)
      .fontSize(9.5)
      .fillColor(INK)
      .text(safe(l), MARGIN + 10, doc.y + 2, { width: w.width - 20 });
  doc
    .font(FONT.italic)
    .fontSize(8)
    .fillColor(INK_2)
    .text("Estimates for negotiation, not quotes.", MARGIN + 10, doc.y + 2, { width: w.width - 20 });
  doc.y = y + boxH + 8;
  doc.x = MARGIN;
}

// Said word for word by the standing cautions and the disclaimer below.
const STANDING = new Set(["not-a-warranty"]);

export function cautionsSection(w: Writer, s: ReportSummary) {
  const { doc } = w;
  w.heading("Cautions");
  const ordered = [...s.evaluation.cautions]
    .filter((c) => !STANDING.has(c.id))
    .sort((a, b) => (a.level === b.level ? 0 : a.level === "warning" ? -1 : 1));
  for (const c of ordered) {
    const text = safe(
      `${c.level === "warning" ? "Take care: " : ""}${c.text}${c.source ? ` (Source: ${c.source.replace(/\.$/, "")}.)` : ""}`,
    );
    doc.font(FONT.body).fontSize(9);
    const h = doc.heightOfString(text, { width: w.width - 16 }) + 10;
    w.ensure(h);
    const y = doc.y;
    if (c.level === "warning") doc.rect(MARGIN, y, w.width, h).fill(WARNING_BG);
    doc.rect(MARGIN, y, 2.5, h).fill(c.level === "warning" ? "#7f5400" : RULE);
    doc
      .font(FONT.body)
      .fontSize(9)
      .fillColor(INK)
      .text(text, MARGIN + 10, y + 5, { width: w.width - 16 });
    doc.y = y + h + 4;
  }
  w.subheading("Before you act on a sewer scope");
  for (const c of CAUTIONS) {
    doc.font(FONT.bold).fontSize(9).fillColor(INK);
    w.ensure(36);
    doc.text(safe(c.title), MARGIN, doc.y, { width: w.width });
    w.para(c.text, { size: 9, colour: INK_2 });
  }
}
