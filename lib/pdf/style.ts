import "server-only";

// The app's tokens (app/globals.css), repeated here because a PDF cannot read CSS.
export const INK = "#1b2422";
export const INK_2 = "#505b57";
export const RULE = "#dad5c9";
export const PAPER_2 = "#f1eee6";
export const TEAL = "#175a53";
export const COPPER = "#9a5128";
export const WARNING_BG = "#fbf0d9";

export const SEVERITY_COLOURS: Record<number, { fg: string; bg: string }> = {
  1: { fg: "#2c6a3d", bg: "#e5f0e6" },
  2: { fg: "#56631a", bg: "#eef0d9" },
  3: { fg: "#875400", bg: "#faedd2" },
  4: { fg: "#a8321e", bg: "#fbe6db" },
  5: { fg: "#8c1730", bg: "#f8e1e3" },
};

export const sevColour = (grade: number) => SEVERITY_COLOURS[Math.min(5, Math.max(1, Math.round(grade)))];

export const FONT = {
  body: "Helvetica",
  bold: "Helvetica-Bold",
  italic: "Helvetica-Oblique",
  heading: "Times-Bold",
  num: "Courier",
} as const;

// The standard PDF fonts only carry WinAnsi: map the few wider characters our wording uses, drop the rest.
const WIN_ANSI_EXTRA = new Set("€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ");
const REPLACE: Record<string, string> = { "≥": ">=", "≤": "<=", "→": "->", "←": "<-", "·": "·", "−": "-", "\u2009": " ", "\u202f": " " };

export function safe(text: string): string {
  let out = "";
  for (const ch of text.normalize("NFC")) {
    const code = ch.codePointAt(0) ?? 0;
    if (code === 10 || (code >= 32 && code < 127) || (code >= 160 && code <= 255) || WIN_ANSI_EXTRA.has(ch)) out += ch;
    else out += REPLACE[ch] ?? "?";
  }
  return out;
}
