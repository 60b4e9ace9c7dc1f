import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { appUrl, axeViolations, launchBrowser, signInThroughForm } from "../utils/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("signing in and out in Chromium", () => {
  it("the landing, sign-in and sign-up pages have no axe violations", async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    for (const path of ["/", "/pricing", "/sign-in", "/sign-up"]) {
      await page.goto(appUrl(path));
      expect(await axeViolations(page), path).toEqual([]);
    }
    await context.close();
  });

  it.each([
    ["agent@gradeline.test", "/orders", "Orders"],
    ["inspector@gradeline.test", "/jobs", "Job board"],
    ["buyer@gradeline.test", "/reports", "My reports"],
    ["admin@gradeline.test", "/admin", "Marketplace overview"],
  ])("%s lands on %s, which has no axe violations, and signs out", async (email, home, heading) => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signInThroughForm(page, email);
    expect(new URL(page.url()).pathname).toBe(home);
    await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent()).toContain(heading);
    expect(await axeViolations(page)).toEqual([]);
    await page.getByRole("button", { name: "Sign out" }).first().click();
    await page.waitForURL(appUrl("/"));
    await page.goto(appUrl(home));
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    await context.close();
  });

  it("a wrong password shows a plain message and stays on sign-in", async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await page.goto(appUrl("/sign-in"));
    await page.getByLabel("E-mail").fill("buyer3@gradeline.test");
    await page.getByLabel("Password").fill("not-the-password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect.poll(() => page.getByRole("alert").first().textContent()).toContain("do not match");
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    await context.close();
  });

  it("a new agent signs up, lands on the orders page, and the wrong role's pages answer 404", async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await page.goto(appUrl("/sign-up"));
    await page.getByRole("button", { name: "Create account" }).click();
    await expect.poll(() => page.getByText("Choose how you will use Gradeline.").count()).toBeGreaterThan(0);
    expect(await axeViolations(page)).toEqual([]);
    expect(await page.getByLabel(/Brokerage/).count()).toBe(0);
    await page.getByLabel(/Buyer's agent/).check();
    // Choosing the agent role asks for the brokerage.
    await page.getByLabel(/Brokerage/).fill("Brannock and Weir Realty");
    await page.getByLabel("Full name").fill("Nell Brannock");
    await page.getByLabel("E-mail").fill(`nell.${Date.now()}@example.test`);
    await page.getByLabel("Password").fill("a-long-enough-password");
    await page.getByRole("button", { name: "Create account" }).click();
    await page.waitForURL(appUrl("/orders"), { timeout: 20_000 });
    const res = await page.goto(appUrl("/admin"));
    expect(res?.status()).toBe(404);
    await context.close();
  });
});
