// Money in Chromium, on the seeded demo world: buyer3 pays for 9 Lantern Street (inspected by
// inspector3, who has no payout account yet), the inspector connects one and exports earnings, the
// admin refunds part of the payment, the buyer disputes the report and the admin closes the dispute.
// (tests/browser/report.test.ts pays for 42 Sluice Gate Way; the two files share one server.)
import fs from "node:fs/promises";

import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { axeViolations, launch, newUser, signIn, type Viewport } from "./helpers";

const STREET = "9 Lantern Street";
const LISTING = `${STREET}, Harrow Falls`;
const DISPUTE_TEXT = "The last stretch to the main was never filmed; the footage stops at the property line.";

let browser: Browser;
const contexts: BrowserContext[] = [];
let reportId = "";

async function as(email: string, home: string | RegExp, viewport: Viewport = "desktop") {
  const user = await newUser(browser, viewport);
  contexts.push(user.context);
  await signIn(user.page, email, home);
  return user;
}

async function expectClean(page: Page, where: string, problems: string[]) {
  await page.waitForLoadState("networkidle");
  expect(await axeViolations(page), where).toEqual([]);
  expect(problems, where).toEqual([]);
}

beforeAll(async () => {
  browser = await launch();
});

afterAll(async () => {
  for (const c of contexts) await c.close().catch(() => undefined);
  await browser?.close();
});

describe("money in the browser", () => {
  it("the buyer pays for the report on the payment page and reads the rated summary", { timeout: 120_000 }, async () => {
    const { page, problems } = await as("buyer3@gradeline.test", /\/reports$/);
    await page.getByRole("link", { name: STREET }).click();
    await page.waitForURL(/\/reports\/[0-9a-f-]{36}$/);
    reportId = new URL(page.url()).pathname.split("/").pop()!;
    await expectClean(page, "locked report", problems);

    await page.getByRole("button", { name: "Unlock the rated summary" }).click();
    await page.waitForURL(/\/pay\//);
    await page.getByLabel("Card number").fill("4242 4242 4242 4242");
    await page.getByLabel("Expiry (MM / YY)").fill("12 / 34");
    await page.getByLabel("CVC").fill("123");
    await page.getByRole("button", { name: "Pay $325.00" }).click();
    await page.waitForURL((url) => url.pathname === `/reports/${reportId}`);
    // The signed webhook, not the redirect, unlocks: the page waits for it.
    await page.getByRole("link", { name: "Download PDF" }).waitFor({ timeout: 30_000 });
    await expectClean(page, "unlocked report", problems);
  });

  it("the inspector sees the amount waiting, connects a payout account, and the CSV lists the jobs", { timeout: 120_000 }, async () => {
    const { page, problems } = await as("inspector3@gradeline.test", /\/jobs$/);
    await page.goto("/earnings");
    await page.getByRole("heading", { level: 2, name: "Connect a payout account" }).waitFor();
    await page.getByText("$260.00 is waiting for you.").waitFor();
    await expectClean(page, "earnings before connecting", problems);

    await page.getByRole("button", { name: "Set up payouts" }).click();
    await page.waitForURL(/\/connect\//);
    await page.getByRole("button", { name: "Finish setup" }).click();
    await page.waitForURL(/\/earnings\?connect=done/);
    await page.getByText("Payout setup finished.").waitFor();

    const jobs = page.getByRole("table", { name: "Every job" });
    const sluice = jobs.getByRole("row", { name: new RegExp(LISTING) });
    // The provider's account event sends the waiting payout; the page shows it on the next load.
    await expect.poll(async () => (await page.reload(), await sluice.innerText()), { timeout: 30_000, interval: 1000 }).toMatch(/Sent/);
    expect(await sluice.innerText()).toMatch(/\$325\.00\s+\$65\.00\s+\$260\.00/);
    // Only this inspector's jobs are listed.
    expect(await jobs.getByRole("row", { name: /42 Sluice Gate Way|17 Ferrule Court/ }).count()).toBe(0);
    expect(await page.getByText("is waiting for you").count()).toBe(0);
    await expectClean(page, "earnings after connecting", problems);

    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Download CSV" }).click()]);
    expect(download.suggestedFilename()).toBe("gradeline-earnings.csv");
    const lines = (await fs.readFile((await download.path())!, "utf8")).trim().split("\r\n");
    expect(lines[0]).toBe('"Paid on","Address","Price (USD)","Platform fee (USD)","Payout (USD)","Reversed (USD)","Status","Sent on"');
    expect(lines).toHaveLength(2);
    const today = new Date().toISOString().slice(0, 10);
    expect(lines[1]).toBe(`"${today}","${LISTING}","325.00","65.00","260.00","0.00","sent","${today}"`);

    const phone = await as("inspector3@gradeline.test", /\/jobs$/, "phone");
    await phone.page.goto("/earnings");
    await phone.page.getByRole("heading", { level: 1, name: "Earnings" }).waitFor();
    await expectClean(phone.page, "earnings on a phone", phone.problems);
  });

  it("the admin refunds part of the payment and the ledger still balances", { timeout: 90_000 }, async () => {
    const { page, problems } = await as("admin@gradeline.test", /\/admin$/);
    await page.goto("/admin/payments");
    const card = page.locator("li", { has: page.getByRole("heading", { name: LISTING }) });
    await card.getByRole("button", { name: "Refund…" }).click();
    await card.getByLabel("Amount to refund (USD)").fill("100.00");
    await card.getByLabel("Reason (recorded in the audit log)").fill("Clip 2 was unreadable");
    await expectClean(page, "refund form", problems);
    await card.getByRole("button", { name: "Refund", exact: true }).click();
    await card.getByText("Refund sent.").waitFor();
    await expect.poll(() => card.innerText()).toMatch(/partially refunded/);
    const text = await card.innerText();
    expect(text).toMatch(/Refunded \$100\.00/);
    expect(text).toMatch(/inspector payout \$260\.00 \(partially reversed, \$80\.00 reversed\)/);
    const ledger = page.locator("section", { has: page.getByRole("heading", { name: "Ledger check" }) });
    expect(await ledger.getByText("Yes", { exact: true }).isVisible()).toBe(true);
    await expectClean(page, "payments after the refund", problems);
  });

  it("the buyer disputes the report; the admin sees it in the queue and closes it with an outcome", { timeout: 90_000 }, async () => {
    const buyer = await as("buyer3@gradeline.test", /\/reports$/);
    await buyer.page.goto(`/reports/${reportId}`);
    const panel = buyer.page.getByRole("region", { name: "Something wrong with this report?" });
    await panel.getByRole("button", { name: "Dispute this report…" }).click();
    await panel.getByRole("button", { name: "Send the dispute" }).click();
    expect(await panel.getByLabel("What is wrong?").getAttribute("aria-invalid")).toBe("true");
    await expectClean(buyer.page, "dispute form with errors", buyer.problems);
    await panel.getByLabel("What is wrong?").selectOption({ label: "Part of the line was not filmed" });
    await panel.getByLabel("What happened").fill(DISPUTE_TEXT);
    await panel.getByRole("button", { name: "Send the dispute" }).click();
    await panel.getByText("Dispute sent").waitFor();
    await buyer.page.reload();
    await panel.getByText("Your dispute is open").waitFor();
    expect(await panel.getByRole("button").count()).toBe(0);
    await expectClean(buyer.page, "report with an open dispute", buyer.problems);

    const admin = await as("admin@gradeline.test", /\/admin$/);
    await admin.page.goto("/admin/disputes");
    const card = admin.page.locator("li", { has: admin.page.getByRole("heading", { name: LISTING }) }).filter({ hasText: DISPUTE_TEXT });
    await card.getByText("Open", { exact: true }).waitFor();
    await expectClean(admin.page, "dispute queue", admin.problems);
    await card.getByLabel("Outcome").selectOption("no_action");
    await card.getByLabel("Decision and reason").fill("Clip 3 reaches the main at 61 ft; sent the buyer its start time.");
    await card.getByRole("button", { name: "Close dispute" }).click();
    await card.getByText("Closed: No action").waitFor();

    await buyer.page.reload();
    await panel.getByText("Your last dispute is closed").waitFor();
    expect(await panel.getByText("Closed: No action").isVisible()).toBe(true);
  });

  it(
    "the admin's order page shows the order's state, timeline, money, dispute and audit trail; others get 404",
    { timeout: 90_000 },
    async () => {
      const { page, problems } = await as("admin@gradeline.test", /\/admin$/);
      await page.goto("/admin/disputes");
      await page
        .locator("li", { has: page.getByRole("heading", { name: LISTING }) })
        .filter({ hasText: DISPUTE_TEXT })
        .getByRole("link", { name: "Order, payments and audit trail" })
        .click();
      await page.waitForURL(`/admin/orders/${reportId}`);
      await page.getByRole("heading", { level: 1, name: STREET }).waitFor();
      const money = page.locator("section", { has: page.getByRole("heading", { name: "Money", exact: true }) });
      expect(await money.getByText("Ledger balances").isVisible()).toBe(true);
      const moneyText = await money.innerText();
      expect(moneyText).toMatch(/Refund \$100\.00 on .* by Wren Okafor: “Clip 2 was unreadable”/);
      expect(moneyText).toMatch(/Inspector payout \$260\.00 · Partly reversed · \$80\.00 reversed/);
      const ledger = page.getByRole("table", { name: "Ledger entries, oldest first" });
      for (const kind of ["Charge", "Platform fee", "Transfer to inspector", "Refund", "Transfer reversed"]) {
        expect(await ledger.getByRole("cell", { name: kind, exact: true }).count(), kind).toBeGreaterThan(0);
      }
      const disputes = page.locator("section", { has: page.getByRole("heading", { name: "Disputes", exact: true }) });
      expect(await disputes.getByText("Closed: No action").isVisible()).toBe(true);
      const audit = page.getByRole("table", { name: "Audit entries for this order, newest first" });
      for (const action of ["Refund", "Dispute opened", "Dispute closed"])
        expect(await audit.getByRole("cell", { name: action, exact: true }).count(), action).toBe(1);
      expect(await page.getByText("Report unlocked by the buyer").isVisible()).toBe(true);
      await expectClean(page, "admin order page", problems);

      const phone = await as("admin@gradeline.test", /\/admin$/, "phone");
      await phone.page.goto(`/admin/orders/${reportId}`);
      await phone.page.getByRole("heading", { level: 1, name: STREET }).waitFor();
      await expectClean(phone.page, "admin order page on a phone", phone.problems);

      const buyer = await as("buyer3@gradeline.test", /\/reports$/);
      expect((await buyer.page.goto(`/admin/orders/${reportId}`))?.status()).toBe(404);
    },
  );

  it(
    "the next buyer of a listing unlocks its fresh report at the reuse price, the inspector's share waits for them, and a full refund locks it again",
    { timeout: 150_000 },
    async () => {
      // 260 Cooper's Ford Road was filmed nine days ago by inspector (Theo Marsh) for buyer (Jordan Avery).
      const REUSED = "260 Cooper's Ford Road";
      const agent = await as("agent2@gradeline.test", /\/orders$/);
      await agent.page.goto("/orders/new");
      await agent.page.getByLabel("Street address", { exact: true }).fill(REUSED);
      await agent.page.getByLabel("Postal code", { exact: true }).fill("97990");
      const deadline = agent.page.getByRole("group", { name: "Inspection contingency deadline" });
      await deadline.getByLabel("Date").fill(new Date(Date.now() + 6 * 86_400_000).toISOString().slice(0, 10));
      await deadline.getByLabel("Time").fill("17:00");
      const offer = agent.page.getByRole("region", { name: "This listing already has a fresh report" });
      await offer.waitFor({ timeout: 15_000 });
      const offerText = await offer.innerText();
      expect(offerText).toContain("by Theo Marsh");
      const reusePrice = offerText.match(/\$(\d+\.\d{2})/)![1];
      expect(Number(reusePrice)).toBeLessThan(325);
      await expectClean(agent.page, "order form with a reuse offer", agent.problems);

      // Without the buyer's details nothing is ordered.
      await offer.getByRole("button", { name: "Offer this report instead" }).click();
      await agent.page.getByText("Enter the buyer's name and e-mail first").waitFor();
      expect(agent.page.url()).toMatch(/\/orders\/new$/);
      await agent.page.getByLabel("Buyer's name").fill("Kai Morrow");
      await agent.page.getByLabel("Buyer's e-mail").fill("buyer2@gradeline.test");
      await offer.getByRole("button", { name: "Offer this report instead" }).click();
      await agent.page.waitForURL(/\/orders\/[0-9a-f-]{36}$/, { timeout: 20_000 });
      const reuseId = agent.page.url().split("/").pop()!;
      await agent.page.getByRole("heading", { level: 1, name: REUSED }).waitFor();
      expect(await agent.page.locator("main").innerText()).toContain(`$${reusePrice}`);

      const buyer = await as("buyer2@gradeline.test", /\/reports$/);
      await buyer.page.goto(`/reports/${reuseId}`);
      await buyer.page.getByRole("button", { name: "Unlock the rated summary" }).click();
      await buyer.page.waitForURL(/\/pay\//);
      await buyer.page.getByLabel("Card number").fill("4242 4242 4242 4242");
      await buyer.page.getByLabel("Expiry (MM / YY)").fill("12 / 34");
      await buyer.page.getByLabel("CVC").fill("123");
      await buyer.page.getByRole("button", { name: `Pay $${reusePrice}` }).click();
      await buyer.page.waitForURL((url) => url.pathname === `/reports/${reuseId}`);
      await buyer.page.getByRole("link", { name: "Download PDF" }).waitFor({ timeout: 30_000 });
      // The first buyer's name never reaches the next one.
      expect(await buyer.page.content()).not.toContain("Jordan Avery");
      await expectClean(buyer.page, "reused report, unlocked", buyer.problems);

      const inspector = await as("inspector@gradeline.test", /\/jobs$/);
      await inspector.page.goto("/earnings");
      const rows = inspector.page.getByRole("table", { name: "Every job" }).getByRole("row", { name: new RegExp(REUSED) });
      await expect.poll(() => rows.count()).toBe(2);
      expect(await rows.filter({ hasText: `$${reusePrice}` }).innerText()).toMatch(/Waiting/);

      const admin = await as("admin@gradeline.test", /\/admin$/);
      await admin.page.goto("/admin/payments");
      const card = admin.page.locator("li", { has: admin.page.getByRole("heading", { name: `${REUSED}, Harrow Falls` }) }).filter({ hasText: "buyer2@gradeline.test" });
      await card.getByRole("button", { name: "Refund…" }).click();
      await card.getByLabel("Amount to refund (USD)").fill(reusePrice);
      await card.getByLabel("Reason (recorded in the audit log)").fill("The buyer's offer fell through the same day");
      await card.getByRole("button", { name: "Refund", exact: true }).click();
      await card.getByText("Refund sent.").waitFor();
      await expect.poll(() => card.innerText()).toMatch(/refunded/);

      await buyer.page.reload();
      await buyer.page.getByText("Sewer scope report · locked").waitFor();
      expect(await buyer.page.getByRole("link", { name: "Download PDF" }).count()).toBe(0);
      expect(await buyer.page.content()).not.toContain("gradeline-severity-v1");
      await inspector.page.reload();
      expect(await rows.filter({ hasText: `$${reusePrice}` }).innerText()).toMatch(/Reversed/);
    },
  );
});
