import "server-only";

import { COPPER, FONT, INK, RULE, safe } from "./style";

export type Doc = PDFKit.PDFDocument;

export const MARGIN = 50;
export const FOOTER_SPACE = 28;

/** Flowing text with page breaks that keep blocks whole. */
export class Writer {
  readonly width: number;
  constructor(readonly doc: Doc) {
    this.width = doc.page.width - MARGIN * 2;
  }

  get bottom() {
    return this.doc.page.height - MARGIN - FOOTER_SPACE;
  }

  /** Starts a new page unless `height` more points fit on this one. */
  ensure(height: number) {
    if (this.doc.y + height > this.bottom) this.doc.addPage();
    this.doc.x = MARGIN;
  }

  gap(points: number) {
    this.doc.y += points;
  }

  heading(text: string) {
    this.ensure(60);
    this.gap(10);
    this.doc.font(FONT.heading).fontSize(15).fillColor(INK).text(safe(text), MARGIN, this.doc.y, { width: this.width });
    const y = this.doc.y + 2;
    this.doc
      .moveTo(MARGIN, y)
      .lineTo(MARGIN + this.width, y)
      .lineWidth(0.6)
      .stroke(RULE);
    this.doc.y = y + 6;
  }

  subheading(text: string) {
    this.ensure(40);
    this.gap(4);
    this.doc.font(FONT.bold).fontSize(10.5).fillColor(INK).text(safe(text), MARGIN, this.doc.y, { width: this.width });
    this.gap(2);
  }

  para(text: string, opts: { size?: number; colour?: string; font?: string; indent?: number } = {}) {
    const indent = opts.indent ?? 0;
    this.doc
      .font(opts.font ?? FONT.body)
      .fontSize(opts.size ?? 9.5)
      .fillColor(opts.colour ?? INK)
      .text(safe(text), MARGIN + indent, this.doc.y, { width: this.width - indent, lineGap: 1.5 });
    this.gap(3);
  }

  /** A bullet; `lead`, when given, is set in bold before the text. */
  bullet(text: string, opts: { size?: number; colour?: string; indent?: number; lead?: string } = {}) {
    const size = opts.size ?? 9.5;
    const indent = opts.indent ?? 0;
    const width = this.width - indent - 12;
    const lead = opts.lead ? `${safe(opts.lead)} ` : "";
    this.doc.font(FONT.body).fontSize(size);
    const h = this.doc.heightOfString(lead + safe(text), { width, lineGap: 1.5 });
    this.ensure(Math.min(h, 40));
    const y = this.doc.y;
    this.doc.circle(MARGIN + indent + 3, y + size * 0.45, 1.4).fill(COPPER);
    if (lead)
      this.doc
        .font(FONT.bold)
        .fillColor(INK)
        .text(lead, MARGIN + indent + 12, y, { width, lineGap: 1.5, continued: true });
    this.doc
      .font(FONT.body)
      .fillColor(opts.colour ?? INK)
      .text(safe(text), lead ? undefined : MARGIN + indent + 12, lead ? undefined : y, { width, lineGap: 1.5 });
    this.doc.x = MARGIN;
    this.gap(2.5);
  }
}
