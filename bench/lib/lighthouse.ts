// P5: Lighthouse (desktop preset) on Debian's Chromium, median of n runs per page.
import * as chromeLauncher from "chrome-launcher";
import lighthouse from "lighthouse";
import desktopConfig from "lighthouse/core/config/desktop-config.js";

import { median } from "./load";

const CHROMIUM = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
const FLAGS = ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"];

export type LighthouseScores = { performance: number; accessibility: number; bestPractices: number; cls: number; failing: string[] };

export async function lighthousePages(pages: { name: string; url: string; cookie?: string }[], runs: number): Promise<Record<string, LighthouseScores>> {
  const chrome = await chromeLauncher.launch({ chromePath: CHROMIUM, chromeFlags: FLAGS });
  const out: Record<string, LighthouseScores> = {};
  try {
    for (const page of pages) {
      const results: LighthouseScores[] = [];
      for (let i = 0; i < runs; i++) {
        const result = await lighthouse(
          page.url,
          { port: chrome.port, output: "json", logLevel: "error", onlyCategories: ["performance", "accessibility", "best-practices"], extraHeaders: page.cookie ? { Cookie: page.cookie } : undefined },
          desktopConfig,
        );
        if (!result) throw new Error(`lighthouse gave no result for ${page.url}`);
        const { categories, audits, runtimeError } = result.lhr;
        if (runtimeError) throw new Error(`lighthouse on ${page.url}: ${runtimeError.code} ${runtimeError.message}`);
        // Audits that cost points in accessibility or best practices, so a miss names its cause.
        const failing = [...categories.accessibility.auditRefs, ...categories["best-practices"].auditRefs]
          .filter((ref) => ref.weight > 0 && audits[ref.id].score !== null && audits[ref.id].score! < 1)
          .map((ref) => ref.id);
        results.push({
          performance: categories.performance.score ?? 0,
          accessibility: categories.accessibility.score ?? 0,
          bestPractices: categories["best-practices"].score ?? 0,
          cls: audits["cumulative-layout-shift"].numericValue ?? 0,
          failing,
        });
      }
      out[page.name] = {
        performance: median(results.map((r) => r.performance)),
        accessibility: median(results.map((r) => r.accessibility)),
        bestPractices: median(results.map((r) => r.bestPractices)),
        cls: median(results.map((r) => r.cls)),
        failing: [...new Set(results.flatMap((r) => r.failing))],
      };
    }
  } finally {
    chrome.kill();
  }
  return out;
}
