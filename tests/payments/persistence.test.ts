import fs from "node:fs";
import os from "node:os";
import path from "node:path";

import { afterAll, describe, expect, it } from "vitest";

import { createSession, startHarness, submitPayForm, SUCCESS_CARD } from "./support/harness";

const dir = fs.mkdtempSync(path.join(os.tmpdir(), "payments-standin-"));
afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

describe("payments stand-in: persistence", () => {
  it("keeps sessions, accounts and idempotency keys across a restart when given a data file", async () => {
    const dataFile = path.join(dir, "nested", "payments-standin.json");
    const first = await startHarness({ dataFile });
    const session = await createSession(first.stripe, {}, { idempotencyKey: "survives-restart" });
    const account = await first.stripe.accounts.create({ type: "express", email: "inspector@example.com" });
    await first.close();
    expect(fs.existsSync(dataFile)).toBe(true);

    const second = await startHarness({ dataFile });
    try {
      expect(await second.stripe.checkout.sessions.retrieve(session.id)).toMatchObject({ status: "open", amount_total: 32500 });
      expect(await second.stripe.accounts.retrieve(account.id)).toMatchObject({ email: "inspector@example.com" });
      const replay = await createSession(second.stripe, {}, { idempotencyKey: "survives-restart" });
      expect(replay.id).toBe(session.id);

      // The session url points at the old port; the hosted page lives on at the new one.
      const res = await submitPayForm(`${second.standin.url}/pay/${session.id}`, SUCCESS_CARD);
      expect(res.status).toBe(303);
      expect((await second.stripe.checkout.sessions.retrieve(session.id)).status).toBe("complete");
    } finally {
      await second.close();
    }
  });

  it("moves an unreadable data file aside and starts empty", async () => {
    const dataFile = path.join(dir, "broken.json");
    fs.writeFileSync(dataFile, "{ not json");
    const h = await startHarness({ dataFile });
    try {
      expect(Object.keys(h.standin.state.checkout_sessions)).toHaveLength(0);
      expect(fs.readdirSync(dir).some((name) => name.startsWith("broken.json.unreadable-"))).toBe(true);
    } finally {
      await h.close();
    }
  });
});
