// The bench report: one markdown table of every figure with its same-run baseline and target.
import fs from "node:fs";
import os from "node:os";
import path from "node:path";

export type Row = { id: string; figure: string; measured: string; baseline: string; ratio: string; target: string; holds: boolean; note?: string };

export const fmt = (n: number, digits = 1) => n.toFixed(digits);

export function machine(): string {
  const cpu = os.cpus()[0]?.model.trim() ?? "unknown CPU";
  return `${os.cpus().length} cores (${cpu}), ${Math.round(os.totalmem() / 2 ** 30)} GiB, Node ${process.version}, ${os.platform()} ${os.release()}`;
}

export function table(rows: Row[]): string {
  const line = (cells: string[]) => `| ${cells.join(" | ")} |`;
  return [
    line(["#", "figure", "measured", "baseline (same run)", "ratio", "target", "holds"]),
    line(["---", "---", "---", "---", "---", "---", "---"]),
    ...rows.map((r) => line([r.id, r.figure, r.measured, r.baseline, r.ratio, r.target, r.holds ? "yes" : `**no**${r.note ? ` (${r.note})` : ""}`])),
  ].join("\n");
}

export function save(markdown: string, startedAt: Date): string {
  const dir = path.join("bench", "results");
  fs.mkdirSync(dir, { recursive: true });
  const stamp = startedAt.toISOString().slice(0, 16).replace("T", "-").replace(":", "");
  const file = path.join(dir, `bench-${stamp}.md`);
  fs.writeFileSync(file, markdown);
  return file;
}
