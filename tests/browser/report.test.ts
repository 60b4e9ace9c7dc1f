// The buyer's unlock, in Chromium: the locked preview holds nothing of the report (page, API, React
// server payload), a declined card leaves it locked, a paid one opens the rated summary; then a
// finding's clip plays from its second, the PDF downloads and reads, and a share link opens signed out.
import fs from "node:fs";

import type { APIRequestContext, Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { pdfText } from "../utils/pdf-text";
import { appUrl, axeViolations, launchBrowser, signInThroughForm } from "../utils/browser";
import { activate, typeInto } from "../utils/keyboard";

const STREET = "42 Sluice Gate Way";
// Words that exist only in the unlocked report of this listing (its narrative, recommendation and
// evaluation) or in a signed storage address: none may reach a browser that has not paid.
const SECRETS = ["Roots enter at several clay joints", "lining the clay section", "X-Amz-Signature", "costBySide", '"severity"', "clips/"];

let browser: Browser;
let reportId: string;

async function person(email: string | null, viewport: "desktop" | "phone" = "desktop"): Promise<{ context: BrowserContext; page: Page; problems: string[] }> {
  const context = await browser.newContext({
    timezoneId: "America/New_York",
    ...(viewport === "phone" ? { viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true } : { viewport: { width: 1280, height: 900 } }),
    acceptDownloads: true,
  });
  const page = await context.newPage();
  const problems: string[] = [];
  page.on("pageerror", (e) => problems.push(`page error: ${e.message}`));
  page.on("response", (r) => {
    if (r.status() >= 500) problems.push(`${r.status()} ${r.url()}`);
  });
  if (email) await signInThroughForm(page, email);
  return { context, page, problems };
}

/** The page's HTML, its React server payload and the report API, as this browser's cookies get them. */
async function everythingServed(request: APIRequestContext) {
  const [html, rsc, api] = await Promise.all([
    request.get(appUrl(`/reports/${reportId}`)),
    request.get(appUrl(`/reports/${reportId}`), { headers: { RSC: "1" } }),
    request.get(appUrl(`/api/reports/${reportId}`)),
  ]);
  return { status: [html.status(), rsc.status(), api.status()], text: [await html.text(), await rsc.text(), await api.text()] };
}

const leaks = (texts: string[]) => SECRETS.filter((s) => texts.some((t) => t.includes(s)));

/** Unlock and pay with the keyboard alone: Tab to each control, type, Enter. */
async function pay(page: Page, card: string) {
  await activate(page, page.getByRole("button", { name: "Unlock the rated summary" }));
  await page.waitForURL((url) => url.pathname.startsWith("/pay/"), { timeout: 20_000 });
  expect(await axeViolations(page)).toEqual([]);
  await typeInto(page, page.getByLabel("Card number"), card);
  await typeInto(page, page.getByLabel("Expiry (MM / YY)"), "12 / 34");
  await typeInto(page, page.getByLabel("CVC"), "123");
  await activate(page, page.getByRole("button", { name: /^Pay / }));
}

beforeAll(async () => {
  browser = await launchBrowser();
  const { context, page } = await person("buyer@gradeline.test");
  const { reports } = (await (await page.request.get(appUrl("/api/reports"))).json()) as { reports: { id: string; street: string; locked: boolean }[] };
  const report = reports.find((r) => r.street === STREET);
  if (!report) throw new Error(`the demo report of ${STREET} is missing`);
  expect(report.locked).toBe(true);
  reportId = report.id;
  await context.close();
});

afterAll(async () => {
  await browser?.close();
});

describe("the buyer's unlock and rated summary in Chromium", () => {
  it("before paying, neither the page, its server payload nor the API carry the rating, findings, costs or clip addresses", async () => {
    const { context, page, problems } = await person("buyer@gradeline.test");
    await page.goto(appUrl("/reports"));
    await page.getByRole("link", { name: new RegExp(STREET) }).first().click();
    await page.waitForURL(`**/reports/${reportId}`);
    const main = (await page.locator("main").textContent()) ?? "";
    expect(main).toContain("What was inspected");
    expect(main).toMatch(/Licence\s*HF-/);
    expect(main).toMatch(/Clips\s*3 video clips/);
    expect(main).toContain("$");
    const served = await everythingServed(page.request);
    expect(served.status).toEqual([200, 200, 200]);
    expect(JSON.parse(served.text[2])).toMatchObject({ locked: true });
    expect(leaks([...served.text, await page.content()])).toEqual([]);
    expect(await axeViolations(page)).toEqual([]);

    // Everyone else: not found, and nothing of the report either.
    for (const email of ["buyer2@gradeline.test", "agent2@gradeline.test", "inspector@gradeline.test"]) {
      const other = await person(email);
      const theirs = await everythingServed(other.page.request);
      // The React server payload of a not-found page may answer 200; what it carries is checked below.
      expect(theirs.status[0], email).toBe(404);
      expect([403, 404], email).toContain(theirs.status[2]);
      expect(leaks(theirs.text), email).toEqual([]);
      await other.context.close();
    }
    // The agent who ordered it reads it only once the buyer has paid.
    const agent = await person("agent@gradeline.test");
    const agentView = await everythingServed(agent.page.request);
    expect(agentView.status[2]).toBe(404);
    expect(leaks(agentView.text)).toEqual([]);
    await agent.context.close();
    expect(problems).toEqual([]);
    await context.close();
  });

  it("by keyboard alone: a declined card leaves the report locked and says so; the success card unlocks it once the provider confirms", async () => {
    const { context, page, problems } = await person("buyer@gradeline.test");
    await page.goto(appUrl(`/reports/${reportId}`));
    await pay(page, "4000 0000 0000 0002");
    await expect.poll(() => page.getByRole("alert").textContent(), { timeout: 10_000 }).toContain("Your card was declined.");
    await activate(page, page.getByRole("button", { name: "Cancel" }));
    await page.waitForURL((url) => url.pathname === `/reports/${reportId}`);
    await expect.poll(() => page.getByText("Payment not completed").count()).toBe(1);
    expect(await page.getByText("Nothing was charged; the report is still locked.").count()).toBe(1);
    expect(leaks([await page.content()])).toEqual([]);

    await pay(page, "4242 4242 4242 4242");
    await page.waitForURL((url) => url.pathname === `/reports/${reportId}` && url.searchParams.has("paid"), { timeout: 20_000 });
    await expect.poll(() => page.getByText("Rated summary").count(), { timeout: 30_000 }).toBeGreaterThan(0);
    await expect.poll(() => page.getByText("Payment received").count(), { timeout: 10_000 }).toBe(1);
    const main = (await page.locator("main").textContent()) ?? "";
    expect(main).toContain("Roots enter at several clay joints");
    expect(main).toMatch(/Severity rating\s*Severity [1-5] of 5/);
    expect(main).toContain("estimates for negotiation, not quotes");
    expect(main).toContain("gradeline-severity-v1");
    expect(main).toMatch(/As observed on [A-Z][a-z]{2} \d{1,2}, \d{4}/);
    expect(await axeViolations(page)).toEqual([]);

    // A bookmark of the return address does not claim a fresh payment forever, and it never charges again.
    const bookmark = page.url();
    await page.goto(bookmark);
    expect(await page.getByText("Rated summary").count()).toBeGreaterThan(0);
    const receipts = page.context().request;
    const { reports } = (await (await receipts.get(appUrl("/api/reports"))).json()) as { reports: { id: string; locked: boolean }[] };
    expect(reports.find((r) => r.id === reportId)?.locked).toBe(false);
    expect(problems).toEqual([]);
    await context.close();

    // The receipt arrives once, with the amount.
    const mailbox = await person(null);
    const receipt = mailbox.page.locator("li", { hasText: `Receipt: sewer scope report for ${STREET}` }).filter({ hasText: "to buyer@gradeline.test" });
    await expect
      .poll(
        async () => {
          await mailbox.page.goto(appUrl("/dev/mailbox"));
          return receipt.count();
        },
        { timeout: 30_000, interval: 1000 },
      )
      .toBe(1);
    await mailbox.context.close();

    // From now on the agent who ordered it can read it.
    const agent = await person("agent@gradeline.test");
    const agentView = await everythingServed(agent.page.request);
    expect(agentView.status[2]).toBe(200);
    expect(agentView.text[2]).toContain("Roots enter at several clay joints");
    await agent.context.close();
  }, 120_000);

  it("plays a finding's clip from its second, downloads a PDF that reads, and shows the diagram's finding on tap on a phone", async () => {
    const { context, page, problems } = await person("buyer@gradeline.test");
    await page.goto(appUrl(`/reports/${reportId}`));
    const play = page.getByRole("button", { name: /^Play the clip of .* from \d+:\d{2}$/ }).first();
    const label = (await play.getAttribute("aria-label"))!;
    const [, clock] = /from (\d+:\d{2})$/.exec(label)!;
    const [m, s] = clock.split(":").map(Number);
    await play.click();
    const video = page.locator("video").first();
    await expect.poll(() => video.evaluate((v: HTMLVideoElement) => v.readyState), { timeout: 20_000 }).toBeGreaterThanOrEqual(1);
    await expect.poll(() => video.evaluate((v: HTMLVideoElement) => v.currentTime), { timeout: 20_000 }).toBeGreaterThanOrEqual(m * 60 + s);
    expect(await video.evaluate((v: HTMLVideoElement) => v.error)).toBeNull();

    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Download PDF" }).click()]);
    const pdf = fs.readFileSync((await download.path())!);
    expect(pdf.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    const text = pdfText(pdf);
    expect(text).toContain(STREET);
    expect(text).toMatch(/SEVERITY RATING [1-5] OF 5/);
    expect(text).toContain("estimates for negotiation, not quotes");
    expect(problems).toEqual([]);
    await context.close();

    const phone = await person("buyer@gradeline.test", "phone");
    await phone.page.goto(appUrl(`/reports/${reportId}`));
    expect(await phone.page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    const mark = phone.page.locator('figure [role="button"][data-finding-index]:visible').first();
    await mark.tap();
    const name = (await mark.getAttribute("aria-label"))!;
    await expect.poll(() => phone.page.locator("figure").first().textContent()).toContain(name.split(",")[0]);
    expect(await axeViolations(phone.page)).toEqual([]);
    expect(phone.problems).toEqual([]);
    await phone.context.close();
  }, 120_000);

  it("a share link opens signed out, read-only, and stops working once revoked", async () => {
    const { context, page, problems } = await person("buyer@gradeline.test");
    await page.goto(appUrl(`/reports/${reportId}#share`));
    await page.getByLabel("Who is it for?").fill("Plumber's quote");
    await page.getByRole("button", { name: "Create link" }).click();
    const url = await page.getByLabel("New share link").inputValue();
    expect(url).toMatch(/\/s\/[A-Za-z0-9_-]{20,}$/);

    const stranger = await person(null);
    const res = await stranger.page.goto(url);
    expect(res?.status()).toBe(200);
    const shared = (await stranger.page.locator("main").textContent()) ?? "";
    expect(shared).toContain(STREET);
    expect(shared).toContain("Roots enter at several clay joints");
    expect(await stranger.page.getByRole("button", { name: /Unlock|Create link|Revoke/ }).count()).toBe(0);
    expect(await axeViolations(stranger.page)).toEqual([]);

    await page.getByRole("button", { name: "Revoke Plumber's quote" }).click();
    await page.getByRole("button", { name: "Revoke", exact: true }).click();
    await expect.poll(() => page.getByText(/Revoked /).count(), { timeout: 10_000 }).toBeGreaterThan(0);
    const after = await stranger.page.goto(url);
    expect(after?.status()).toBe(404);
    expect(leaks([await stranger.page.content()])).toEqual([]);
    expect(problems).toEqual([]);
    await stranger.context.close();
    await context.close();
  });
});
