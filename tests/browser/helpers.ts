// Helpers for tests that sign in with a base URL and their own cookies; the browser and axe come from tests/utils/browser.
import type { Browser, BrowserContext, Page } from "playwright-core";

import { axeViolations, launchBrowser } from "../utils/browser";

export { axeViolations };
export const PASSWORD = "gradeline-demo";
export const base = () => process.env.GRADELINE_URL!;
export const launch = launchBrowser;

export type Viewport = "desktop" | "phone";

/** A fresh browser profile (own cookies) that reports page errors and 5xx answers into `problems`. */
export async function newUser(
  browser: Browser,
  viewport: Viewport = "desktop",
): Promise<{ context: BrowserContext; page: Page; problems: string[] }> {
  const context = await browser.newContext({
    baseURL: base(),
    timezoneId: "America/Los_Angeles",
    ...(viewport === "phone"
      ? { viewport: { width: 375, height: 812 }, isMobile: true, hasTouch: true }
      : { viewport: { width: 1280, height: 900 } }),
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

/** POST JSON from inside the signed-in page's context (same origin, same cookies). */
export async function postJson(page: Page, path: string, body: unknown): Promise<{ status: number; json: unknown }> {
  const res = await page.request.post(path, { data: body, headers: { origin: base() } });
  return { status: res.status(), json: await res.json().catch(() => null) };
}
