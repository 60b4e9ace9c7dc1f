import fs from "node:fs";
import path from "node:path";

function newestSource(dir: string): number {
  let newest = 0;
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    if (["node_modules", ".next", ".data", ".git", "tests", "bench", "next-env.d.ts"].includes(entry.name) || entry.name.endsWith(".tsbuildinfo")) continue;
    const full = path.join(dir, entry.name);
    newest = Math.max(newest, entry.isDirectory() ? newestSource(full) : fs.statSync(full).mtimeMs);
  }
  return newest;
}

/** True when .next was built after the last change to any source the build reads. */
export function buildIsFresh(): boolean {
  const id = path.join(".next", "BUILD_ID");
  return fs.existsSync(id) && fs.statSync(id).mtimeMs >= newestSource(".");
}
