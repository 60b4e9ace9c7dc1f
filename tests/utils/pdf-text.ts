import { inflateSync } from "node:zlib";

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
export function pdfText(pdf: Buffer): string {
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
