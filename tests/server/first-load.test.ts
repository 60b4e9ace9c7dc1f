// P4 as a budget in CI, read from the build the server tests run on. The quality target (130 kB of
// First Load JS on every route) cannot hold on Next.js 16: React, React DOM and the Next.js runtime
// weigh about 131.5 kB gzip before any Gradeline code (see the README's Performance section). So this
// guards what Gradeline adds: no route grows past its budget, and the heavy parts stay off the browser.
import fs from "node:fs";
import path from "node:path";

import { describe, expect, it } from "vitest";

import { firstLoadJs } from "../../scripts/lib/first-load";

// Gzip kB a route may add to the framework's chunks: the forms (zod and react-hook-form) sit near 80.
const ROUTE_BUDGET_KB = 90;
// Strings that only the server-side libraries hold; none may reach a browser chunk.
const SERVER_ONLY = ["PDFDocument", "electric-sql", "CompleteMultipartUploadCommand", "webhooks.constructEvent", "gradeline-severity-v1"];

describe("the browser's JavaScript per route (P4)", () => {
  const fl = firstLoadJs((route) => route.startsWith("/bench/"));

  it("reads every route of the build", () => {
    expect(fl.routes.map((r) => r.route)).toEqual(expect.arrayContaining(["/", "/orders", "/orders/new", "/jobs/[id]/work", "/reports/[id]", "/admin"]));
    expect(fl.frameworkKb).toBeGreaterThan(50);
  });

  it(`adds at most ${ROUTE_BUDGET_KB} kB (gzip) to the framework on any route`, () => {
    const over = fl.routes.filter((r) => r.totalKb - fl.frameworkKb > ROUTE_BUDGET_KB).map((r) => `${r.route}: ${(r.totalKb - fl.frameworkKb).toFixed(1)} kB`);
    expect(over).toEqual([]);
  });

  it("keeps the PDF maker, the database, storage, payments and the rating engine out of every browser chunk", () => {
    const chunks = [...new Set(fl.routes.flatMap((r) => r.chunks))];
    const leaks = chunks.flatMap((c) => {
      const text = fs.readFileSync(path.join(".next", c), "utf8");
      return SERVER_ONLY.filter((s) => text.includes(s)).map((s) => `${c}: ${s}`);
    });
    expect(leaks).toEqual([]);
  });

  it("looks for strings the server build really holds, so the check above can catch a leak", () => {
    const serverFiles = (dir: string): string[] =>
      fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? serverFiles(path.join(dir, e.name)) : e.name.endsWith(".js") ? [path.join(dir, e.name)] : []));
    const server = serverFiles(path.join(".next", "server")).map((f) => fs.readFileSync(f, "utf8"));
    for (const s of SERVER_ONLY) expect(server.some((text) => text.includes(s)), s).toBe(true);
  });
});
