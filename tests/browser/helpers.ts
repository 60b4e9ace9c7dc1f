import { AxeBuilder } from "@axe-core/playwright";
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";

export const PASSWORD = "gradeline-demo";
export const base = () => process.env.GRADELINE_URL!;

const CHROMIUM_FLAGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export function launch(): Promise<Browser> {
  return chromium.launch({ executablePath: process.env.CHROMIUM_PATH || "/usr/bin/chromium", args: CHROMIUM_FLAGS });
}

export type Viewport = "desktop" | "phone";

/** A fresh browser profile (own cookies) that reports page errors and 5xx answers into `problems`. */
export async function newUser(browser: Browser, viewport: Viewport = "desktop"): Promise<{ context: BrowserContext; page: Page; problems: string[] }> {
  const context = await browser.newContext({
    baseURL: base(),
    timezoneId: "America/Los_Angeles",
    ...(viewport === "phone" ? { viewport: { width: 375, height: 812 }, isMobile: true, hasTouch: true } : { viewport: { width: 1280, height: 900 } }),
  });
  const page = await context.newPage();
  const problems: string[] = [];
  page.on("pageerror", (e) => problems.push(`page error: ${e.message}`));
  page.on("response", (r) => {
    if (r.status() >= 500) problems.push(`${r.status()} ${r.url()}`);
  });
  return { context, page, problems };
}

/** Signs in through the /sign-in form, as a person would, and waits for the role's home. */
export async function signIn(page: Page, email: string, home: string | RegExp): Promise<void> {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(home);
}

/** Axe with the WCAG 2.2 AA rule set; answers a readable list of what failed (empty when clean). */
export async function axeViolations(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa"]).analyze();
  return results.violations.map((v) => `${v.id} (${v.impact}): ${v.help} at ${v.nodes.map((n) => n.target.join(" ")).slice(0, 3).join(", ")}`);
}

/** POST JSON from inside the signed-in page's context (same origin, same cookies). */
export async function postJson(page: Page, path: string, body: unknown): Promise<{ status: number; json: unknown }> {
  const res = await page.request.post(path, { data: body, headers: { origin: base() } });
  return { status: res.status(), json: await res.json().catch(() => null) };
}
