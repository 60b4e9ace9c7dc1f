import AxeBuilder from "@axe-core/playwright";
import { chromium, type Browser, type Page } from "playwright-core";

export const CHROMIUM_FLAGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: CHROMIUM_FLAGS });
}

export const appUrl = (path = "/") => `${process.env.GRADELINE_URL}${path}`;

/** Zero axe-core violations for WCAG 2.0/2.1 A and AA and WCAG 2.2 AA; returns them for a readable failure. */
export async function axeViolations(page: Page) {
  // A router refresh swaps the page's <title> for the new one a moment later; let it land so axe sees
  // the page as it settles. A page that truly has no title still fails below once this wait ends.
  await page.waitForFunction(() => document.title.trim() !== "", null, { timeout: 5_000 }).catch(() => undefined);
  const result = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa"]).analyze();
  return result.violations.map((v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(" ")).join(", ")})`);
}

export async function signInThroughForm(page: Page, email: string, password = "gradeline-demo") {
  await page.goto(appUrl("/sign-in"));
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in") && url.pathname !== "/home", { timeout: 20_000 });
}
