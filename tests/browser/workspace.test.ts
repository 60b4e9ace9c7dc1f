import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { appUrl, axeViolations, launchBrowser, signInThroughForm } from "../utils/browser";
import { addLocate, openSection, recordProfile } from "../utils/workspace";

const SECTIONS = ["clips", "access", "profile", "locates", "boundary", "findings", "narrative", "review"];

let browser: Browser;
let jobId: string;

async function signedIn(viewport?: {
  width: number;
  height: number;
}): Promise<{ context: BrowserContext; page: Page; problems: string[] }> {
  const context = await browser.newContext(
    viewport ? { viewport, isMobile: true, hasTouch: true } : { viewport: { width: 1280, height: 900 } },
  );
  const page = await context.newPage();
  const problems: string[] = [];
  page.on("pageerror", (e) => problems.push(`page error: ${e.message}`));
  page.on("response", (r) => {
    if (r.status() >= 500) problems.push(`${r.status()} ${r.url()}`);
  });
  await signInThroughForm(page, "inspector@gradeline.test");
  return { context, page, problems };
}

const saveStatus = (page: Page) => page.locator("[data-save-status]").getAttribute("data-save-status");

beforeAll(async () => {
  browser = await launchBrowser();
  const { context, page } = await signedIn();
  const res = await page.request.get(appUrl("/api/jobs?assigned=me"));
  const { jobs } = (await res.json()) as { jobs: { id: string; status: string; address: { street: string } }[] };
  const job = jobs.find((j) => j.address.street === "5 Kilnworks Lane");
  if (!job) throw new Error("the demo job at 5 Kilnworks Lane is missing");
  expect(job.status).toBe("scheduled");
  jobId = job.id;
  await context.close();
});

afterAll(async () => {
  await browser?.close();
});

describe("the inspector's job workspace in Chromium", () => {
  it("records a line profile and a finding, draws them, keeps the draft over a reload and lists what blocks submitting", async () => {
    const { context, page, problems } = await signedIn();
    await page.goto(appUrl(`/jobs/${jobId}/work`));
    await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent()).toContain("5 Kilnworks Lane");

    await openSection(page, "access");
    await page.getByLabel("Cleanout inside").check();
    await page.getByLabel("Where it is").fill("Basement, behind the water heater");

    await recordProfile(page, "40", [
      { to: "9", material: "cast_iron", diameterIn: "4" },
      { to: "40", material: "vitrified_clay", diameterIn: "4" },
    ]);

    await addLocate(page, 0, { at: "12", depthFt: "3.2", surface: "soil" });

    const mark = page.locator('figure [role="button"][data-finding-index="0"]:visible');
    expect(await mark.count()).toBe(0);
    await openSection(page, "findings");
    await page.getByRole("button", { name: "Add a finding" }).click();
    await page.locator("#f-findings-0-type").selectOption("roots");
    await page.locator("#f-findings-0-at").fill("16.5");
    await page.locator("#finding-0 label", { hasText: "Moderate" }).click();
    await page.locator("#f-findings-0-lossPct").fill("20");

    await expect.poll(() => mark.getAttribute("aria-label"), { timeout: 10_000 }).toBe("Roots, 16.5 ft, grade 3 (Moderate)");
    expect(await page.locator("figure").textContent()).toContain("~3.2 ft");
    await expect.poll(() => page.getByRole("status").filter({ hasText: "Rating so far" }).count(), { timeout: 10_000 }).toBe(1);
    await expect.poll(() => saveStatus(page), { timeout: 15_000 }).toBe("saved");
    expect(await page.locator("[data-save-status]").textContent()).toMatch(/Saved · \d{2}:\d{2}/);
    expect(await axeViolations(page)).toEqual([]);

    await page.reload();
    await openSection(page, "profile");
    expect(await page.locator("#f-segments-1-to").inputValue()).toBe("40");
    expect(await page.locator("#f-segments-1-material").inputValue()).toBe("vitrified_clay");
    await openSection(page, "findings");
    expect(await page.locator("#f-findings-0-type").inputValue()).toBe("roots");
    expect(await page.locator("#f-findings-0-lossPct").inputValue()).toBe("20");
    await expect.poll(() => mark.count()).toBe(1);

    await page.getByRole("button", { name: "Review and submit", exact: true }).click();
    await expect.poll(() => page.locator("#panel-review").isVisible()).toBe(true);
    await page.locator("#panel-review").getByRole("button", { name: "Submit and deliver" }).click();
    await expect.poll(() => page.locator("#review-problems").textContent(), { timeout: 10_000 }).toContain("Narrative");
    const clips = (await (await page.request.get(appUrl(`/api/jobs/${jobId}/clips`))).json().catch(() => ({ clips: [] }))) as {
      clips?: { status: string }[];
    };
    if (!(clips.clips ?? []).some((c) => c.status === "ready")) {
      expect(await page.locator("#review-problems").textContent()).toContain("at least one ready clip");
    }
    await page.locator("#review-problems button", { hasText: "Narrative" }).first().click();
    await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe("f-narrative");
    expect(await axeViolations(page)).toEqual([]);
    expect(problems).toEqual([]);
    await context.close();
  });

  it("a second tab's save is not overwritten: the stale tab is told to reload", async () => {
    const { context, page } = await signedIn();
    await page.goto(appUrl(`/jobs/${jobId}/work`));
    const other = await context.newPage();
    await other.goto(appUrl(`/jobs/${jobId}/work`));

    await openSection(other, "access");
    await other.getByLabel("Where it is").fill("Basement, behind the water heater, left of the stairs");
    await expect.poll(() => saveStatus(other), { timeout: 15_000 }).toBe("saved");

    await openSection(page, "access");
    await page.getByLabel("Where it is").fill("Changed in the stale tab");
    await expect.poll(() => saveStatus(page), { timeout: 15_000 }).toBe("conflict");
    expect(await page.getByRole("alert").filter({ hasText: "changed in another tab or device" }).count()).toBe(1);
    await page.getByRole("button", { name: "Reload" }).click();
    await page.waitForLoadState("load");
    await openSection(page, "access");
    expect(await page.getByLabel("Where it is").inputValue()).toBe("Basement, behind the water heater, left of the stairs");
    await context.close();
  });

  it("on a 390 x 844 phone every step opens above the bottom bar, with tap targets of 44 px or more", async () => {
    const { context, page, problems } = await signedIn({ width: 390, height: 844 });
    await page.goto(appUrl(`/jobs/${jobId}/work`));
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    for (const id of SECTIONS) {
      await openSection(page, id);
      const header = page.locator(`#section-${id}`);
      await header.scrollIntoViewIfNeeded();
      const box = await header.boundingBox();
      expect(box && box.height >= 44, `${id} header height`).toBe(true);
      const onTop = await header.evaluate((el) => {
        const r = el.getBoundingClientRect();
        return el.contains(document.elementFromPoint(r.left + r.width / 2, r.top + r.height / 2));
      });
      expect(onTop, `${id} header is not covered`).toBe(true);
    }
    const small = await page
      .locator("#main button:visible, #main select:visible, #main input:not([type=radio]):visible")
      .evaluateAll((els) =>
        els
          .filter((el) => el.getBoundingClientRect().height < 44 && !el.closest("svg"))
          .map((el) => el.outerHTML.slice(0, 80)),
      );
    expect(small).toEqual([]);
    const bar = await page.getByRole("button", { name: "Review and submit", exact: true }).boundingBox();
    expect(bar && bar.y + bar.height <= 844 && bar.height >= 44).toBe(true);
    expect(await axeViolations(page)).toEqual([]);
    expect(problems).toEqual([]);
    await context.close();
  });
});
