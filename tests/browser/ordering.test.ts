import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { isoToZonedLocal, zonedLocalToIso } from "@/lib/time-zones";

import { axeViolations, launch, newUser, postJson, signIn } from "./helpers";

const TZ = "America/Los_Angeles";
const DAY = 86_400_000;

/** The listing's local date `days` from now, as a date input wants it. */
const localDate = (days: number) => isoToZonedLocal(new Date(Date.now() + days * DAY).toISOString(), TZ)!.date;
const street = (name: string) => `${Math.floor(100 + Math.random() * 800)} ${name}`;

function orderBody(address: string) {
  return {
    address: { street: address, city: "Harrow Falls", state: "OR", postalCode: "97991" },
    propertyType: "single_family",
    occupancy: "vacant",
    accessNotes: "Lockbox on the back porch rail.",
    cleanoutKnown: true,
    cleanoutNote: "Outside by the north downspout.",
    deadline: zonedLocalToIso(localDate(6), "17:00", TZ),
    visitWindows: [{ start: zonedLocalToIso(localDate(2), "09:00", TZ), end: zonedLocalToIso(localDate(2), "12:00", TZ) }],
    anyTimeInWindows: false,
    buyer: { name: "Wren Halloway", email: "wren.halloway@example.test" },
  };
}

async function fillOrderForm(page: Page, o: { address: string; postalCode: string; deadlineInDays: number }) {
  await page.getByLabel("Street address", { exact: true }).fill(o.address);
  await page.getByLabel("City", { exact: true }).fill("Harrow Falls");
  await page.getByLabel("Postal code", { exact: true }).fill(o.postalCode);
  await page.getByLabel("Property type").selectOption("single_family");
  await page.getByLabel("Year built").fill("1958");
  await page.getByLabel("Who lives there now").selectOption("owner");
  await page.getByLabel("Access instructions").fill("Owner home after 10 am; ring the side door.");
  await page.getByLabel("Where is the cleanout?").fill("Basement, behind the water heater.");
  const deadline = page.getByRole("group", { name: "Inspection contingency deadline" });
  await deadline.getByLabel("Date").fill(localDate(o.deadlineInDays));
  await deadline.getByLabel("Time").fill("17:00");
  const window1 = page.getByRole("group", { name: "Window 1" });
  await window1.getByLabel("Day").fill(localDate(Math.min(2, o.deadlineInDays)));
  await window1.getByLabel("From").fill("09:00");
  await window1.getByLabel("Until").fill("12:00");
  await page.getByLabel("Buyer's name").fill("Odile Farrant");
  await page.getByLabel("Buyer's e-mail").fill("odile.farrant@example.test");
}

/** The error text a control points at through aria-describedby. */
async function describedError(page: Page, label: string): Promise<string> {
  const control = page.getByLabel(label, { exact: true });
  expect(await control.getAttribute("aria-invalid")).toBe("true");
  const ids = ((await control.getAttribute("aria-describedby")) ?? "").split(" ").filter(Boolean);
  const texts = await Promise.all(ids.map((id) => page.locator(`[id="${id}"]`).textContent()));
  return texts.join(" ");
}

async function expectNoAxeViolations(page: Page) {
  expect(await axeViolations(page)).toEqual([]);
}

let browser: Browser;

beforeAll(async () => {
  browser = await launch();
});

afterAll(async () => {
  await browser?.close();
});

describe("ordering and dispatch in the browser", () => {
  it("an agent orders a scope and sees its price; an inspector accepts and proposes a time; the agent confirms it", { timeout: 240_000 }, async () => {
    const agent = await newUser(browser);
    const inspector = await newUser(browser);
    const address = street("Culvert Lane");
    try {
      const a = agent.page;
      await signIn(a, "agent@gradeline.test", /\/orders$/);
      await a.getByText(/\d+ orders?/).first().waitFor();
      await expectNoAxeViolations(a);

      await a.getByRole("link", { name: "New order" }).first().click();
      await a.waitForURL(/\/orders\/new$/);
      await expectNoAxeViolations(a);

      await a.getByRole("button", { name: "Place order" }).click();
      await expect.poll(() => a.getByText("Enter the street address.").isVisible()).toBe(true);
      await expect.poll(() => a.getByText("Enter the buyer's e-mail: the report invitation goes there.").isVisible()).toBe(true);
      expect(await describedError(a, "Street address")).toContain("Enter the street address.");
      expect(await a.getByText("Enter the date and time the inspection contingency ends.").isVisible()).toBe(true);
      await expectNoAxeViolations(a);

      await fillOrderForm(a, { address, postalCode: "97991", deadlineInDays: 6 });

      const price = a.getByRole("region", { name: "Price" });
      await price.getByText("Total").waitFor();
      expect(await price.getByText("Sewer scope", { exact: true }).isVisible()).toBe(true);
      expect(await price.textContent()).toMatch(/\$\d[\d,]*\.\d{2}/);
      expect(await price.textContent()).not.toContain("Rush");

      await a.getByRole("button", { name: "Place order" }).click();
      await a.waitForURL(/\/orders\/[0-9a-f-]{36}$/);
      const orderUrl = a.url();
      await a.getByRole("heading", { level: 1, name: address }).waitFor();
      expect(await a.getByText("Order placed").isVisible()).toBe(true);
      await expectNoAxeViolations(a);

      const i = inspector.page;
      await signIn(i, "inspector@gradeline.test", /\/jobs$/);
      const card = i.getByRole("listitem").filter({ has: i.getByRole("heading", { name: address }) });
      await card.waitFor();
      await expectNoAxeViolations(i);
      await card.getByRole("button", { name: `Accept job at ${address}` }).click();
      await i.getByText(`You have the job at ${address}`).waitFor();
      await expect.poll(() => card.count()).toBe(0);

      await i.getByRole("link", { name: "Open the job" }).click();
      await i.waitForURL(/\/jobs\/[0-9a-f-]{36}$/);
      await i.getByRole("heading", { name: "Propose visit times" }).waitFor();
      await expectNoAxeViolations(i);
      const slot = i.getByRole("group", { name: "Visit time 1" });
      expect(await slot.getByLabel("Day").inputValue()).toBe(localDate(2));
      expect(await slot.getByLabel("From").inputValue()).toBe("09:00");
      await slot.getByLabel("Until").fill("10:30");
      await i.getByRole("button", { name: "Propose this time" }).click();
      await i.getByText("Sent. The agent has an e-mail with your times.").waitFor();
      await i.getByText("Waiting for the agent").waitFor();

      await a.goto(orderUrl);
      const confirm = a.getByRole("button", { name: /^Confirm / });
      await confirm.waitFor();
      await expectNoAxeViolations(a);
      await confirm.click();
      await a.getByText("Appointment confirmed. The inspector and the buyer get an e-mail").waitFor();
      await a.getByRole("heading", { name: "Appointment" }).waitFor();
      await expect.poll(() => a.getByText("Confirmed visit").isVisible()).toBe(true);
      const state = a.locator("p", { hasText: /^State/ }).first();
      expect(await state.textContent()).toContain("Scheduled");
      expect(await a.getByText("Appointment confirmed", { exact: true }).isVisible()).toBe(true);

      await a.goto("/orders");
      const row = a.getByRole("row").filter({ hasText: address });
      await row.waitFor();
      expect(await row.textContent()).toContain("Scheduled");

      expect([...agent.problems, ...inspector.problems]).toEqual([]);
    } finally {
      await agent.context.close();
      await inspector.context.close();
    }
  });

  it("the order form refuses a passed deadline and an unserved postal code with plain messages, and places nothing", { timeout: 240_000 }, async () => {
    const agent = await newUser(browser);
    const address = street("Spillway Road");
    try {
      const a = agent.page;
      await signIn(a, "agent@gradeline.test", /\/orders$/);
      await a.goto("/orders/new");
      await fillOrderForm(a, { address, postalCode: "97991", deadlineInDays: -1 });
      await a.getByRole("button", { name: "Place order" }).click();
      await a.getByText("The contingency deadline has passed. Check the date, or ask the seller's side for an extension first.").waitFor();
      expect(await a.getByRole("region", { name: "Price" }).textContent()).toContain("This deadline has already passed.");

      await fillOrderForm(a, { address, postalCode: "90210", deadlineInDays: 6 });
      await a.getByRole("region", { name: "Price" }).getByText("No inspector serves this postal code yet").waitFor();
      await a.getByRole("button", { name: "Place order" }).click();
      await a.getByText("The order was not placed").waitFor();
      await expect.poll(() => describedError(a, "Postal code")).toContain("No verified inspector serves 90210 yet.");
      expect(a.url()).toMatch(/\/orders\/new$/);
      await expectNoAxeViolations(a);

      const list = await a.request.get(`/api/orders?q=${encodeURIComponent(address)}`);
      expect(((await list.json()) as { total: number }).total).toBe(0);
      expect(agent.problems).toEqual([]);
    } finally {
      await agent.context.close();
    }
  });

  it("the board refuses a job to inspector2 once inspector took it, and says so", { timeout: 240_000 }, async () => {
    const agent = await newUser(browser);
    const first = await newUser(browser);
    const second = await newUser(browser);
    const address = street("Weir Street");
    try {
      await signIn(agent.page, "agent@gradeline.test", /\/orders$/);
      const created = await postJson(agent.page, "/api/orders", orderBody(address));
      expect(created.status).toBe(201);
      const orderId = (created.json as { id: string }).id;

      await signIn(second.page, "inspector2@gradeline.test", /\/jobs$/);
      const card = second.page.getByRole("listitem").filter({ has: second.page.getByRole("heading", { name: address }) });
      await card.waitFor();

      await signIn(first.page, "inspector@gradeline.test", /\/jobs$/);
      expect((await postJson(first.page, `/api/jobs/${orderId}/accept`, {})).status).toBe(200);

      await card.getByRole("button", { name: `Accept job at ${address}` }).click();
      await second.page.getByText("Another inspector took this job a moment ago.").waitFor();
      await expect.poll(() => card.count()).toBe(0);
      await expectNoAxeViolations(second.page);

      expect([...agent.problems, ...first.problems, ...second.problems]).toEqual([]);
    } finally {
      await Promise.all([agent.context.close(), first.context.close(), second.context.close()]);
    }
  });

  it("on a phone the orders table is a list of cards, and the order form and profile pass axe", { timeout: 240_000 }, async () => {
    const agent = await newUser(browser, "phone");
    const inspector = await newUser(browser, "phone");
    try {
      const a = agent.page;
      await signIn(a, "agent@gradeline.test", /\/orders$/);
      const cards = a.getByRole("list", { name: "Your orders" });
      await cards.getByRole("listitem").first().waitFor();
      expect(await a.getByRole("table").isVisible()).toBe(false);
      expect(await a.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);
      await expectNoAxeViolations(a);

      await a.goto("/orders/new");
      await a.getByRole("button", { name: "Place order" }).waitFor();
      expect(await a.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);
      await expectNoAxeViolations(a);

      const i = inspector.page;
      await signIn(i, "inspector@gradeline.test", /\/jobs$/);
      await i.goto("/profile");
      await i.getByRole("heading", { name: "Service area" }).waitFor();
      expect(await i.getByRole("list", { name: "Postal codes you serve" }).textContent()).toContain("97991");
      expect(await i.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);
      await expectNoAxeViolations(i);

      expect([...agent.problems, ...inspector.problems]).toEqual([]);
    } finally {
      await agent.context.close();
      await inspector.context.close();
    }
  });
});
