// The main flow without a pointer: an agent orders a scope, an inspector takes the job and writes
// in the workspace, using Tab, typing, Enter and Space only, with the focus visible at every stop.
// (The buyer's unlock and payment by keyboard is in tests/browser/report.test.ts.)
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { isoToZonedLocal } from "@/lib/time-zones";

import { appUrl, axeViolations, launchBrowser } from "../utils/browser";
import { activate, signInByKeyboard, tabTo, typeInto } from "../utils/keyboard";
import { newUser } from "./helpers";

const TZ = "America/Los_Angeles";
const DAY = 86_400_000;
const address = `${Math.floor(100 + Math.random() * 800)} Weir Crossing`;

/** The listing's local date `days` from now, as typed into a date field (month, day, year). */
function typedDate(days: number): string {
  const [y, m, d] = isoToZonedLocal(new Date(Date.now() + days * DAY).toISOString(), TZ)!.date.split("-");
  return `${m}${d}${y}`;
}

let browser: Browser;
let jobId = "";

async function personPage() {
  const { context, page, problems } = await newUser(browser);
  return { page, problems, close: () => context.close() };
}

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe("the main flow by keyboard alone", () => {
  it("an agent signs in and places an order with Tab, typing and Enter", { timeout: 120_000 }, async () => {
    const { page, problems, close } = await personPage();
    await signInByKeyboard(page, appUrl("/sign-in"), "agent@gradeline.test");
    await activate(page, page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "New order" }));
    await page.waitForURL((url) => url.pathname === "/orders/new");

    await typeInto(page, page.getByLabel("Street address", { exact: true }), address);
    await typeInto(page, page.getByLabel("City", { exact: true }), "Harrow Falls");
    await typeInto(page, page.getByLabel("Postal code", { exact: true }), "97990");
    await typeInto(page, page.getByLabel("Property type"), "Single");
    await typeInto(page, page.getByLabel("Year built"), "1957");
    await typeInto(page, page.getByLabel("Who lives there now"), "Owner");
    await typeInto(page, page.getByLabel("Access instructions"), "Side gate is open; the owner is home after 9 am.");
    await typeInto(page, page.getByLabel("Where is the cleanout?"), "Outside, by the south hose bib.");
    const deadline = page.getByRole("group", { name: "Inspection contingency deadline" });
    await typeInto(page, deadline.getByLabel("Date"), typedDate(6));
    await typeInto(page, deadline.getByLabel("Time"), "0500PM");
    const window1 = page.getByRole("group", { name: "Window 1" });
    await typeInto(page, window1.getByLabel("Day"), typedDate(2));
    await typeInto(page, window1.getByLabel("From"), "0900AM");
    await typeInto(page, window1.getByLabel("Until"), "1200PM");
    await typeInto(page, page.getByLabel("Buyer's name"), "Marit Vollan");
    await typeInto(page, page.getByLabel("Buyer's e-mail"), "marit.vollan@example.test");
    await page.getByRole("region", { name: "Price" }).getByText("Total").waitFor();

    await activate(page, page.getByRole("button", { name: "Place order" }));
    await page.waitForURL(/\/orders\/[0-9a-f-]{36}$/, { timeout: 20_000 });
    await page.getByRole("heading", { level: 1, name: address }).waitFor();
    expect(await page.getByText("Order placed").isVisible()).toBe(true);
    expect(await page.locator("main").textContent()).toContain("Marit Vollan");
    expect(await axeViolations(page)).toEqual([]);
    expect(problems).toEqual([]);
    await close();
  });

  it("an inspector takes the job from the board, opens it and writes in the workspace with the keyboard", { timeout: 120_000 }, async () => {
    const { page, problems, close } = await personPage();
    await signInByKeyboard(page, appUrl("/sign-in"), "inspector@gradeline.test");
    await page.getByRole("heading", { level: 1, name: "Job board" }).waitFor();
    await activate(page, page.getByRole("button", { name: `Accept job at ${address}` }));
    await page.getByText(`You have the job at ${address}`).waitFor();
    await activate(page, page.getByRole("link", { name: "Open the job" }));
    await page.waitForURL(/\/jobs\/[0-9a-f-]{36}$/);
    jobId = new URL(page.url()).pathname.split("/").pop()!;
    await page.getByRole("heading", { level: 1, name: address }).waitFor();

    await page.goto(appUrl(`/jobs/${jobId}/work`));
    const narrative = page.locator("#section-narrative");
    await tabTo(page, narrative);
    if ((await narrative.getAttribute("aria-expanded")) !== "true") await page.keyboard.press("Enter");
    await expect.poll(() => page.locator("#panel-narrative").isVisible()).toBe(true);
    await typeInto(page, page.getByLabel("Your summary for the buyer"), "PVC from the house to the main; no defects seen.");
    await expect.poll(() => page.locator("[data-save-status]").getAttribute("data-save-status"), { timeout: 15_000 }).toBe("saved");
    type Draft = { inspection: { narrative?: string | null } };
    const draft = (await (await page.request.get(appUrl(`/api/jobs/${jobId}/inspection`))).json()) as Draft;
    expect(draft.inspection.narrative).toBe("PVC from the house to the main; no defects seen.");
    expect(await axeViolations(page)).toEqual([]);
    expect(problems).toEqual([]);
    await close();
  });
});
