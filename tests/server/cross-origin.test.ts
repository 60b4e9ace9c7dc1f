import { describe, expect, it } from "vitest";

import { base, signIn } from "../utils/http-session";
import { orderBody } from "./support/orders";

const EVIL = "https://listings.example";

async function orderCount(cookie: string) {
  const res = await fetch(`${base()}/api/orders?pageSize=1`, { headers: { cookie } });
  return ((await res.json()) as { total: number }).total;
}

describe("R15 cross-origin POSTs with the victim's cookie, against the running app", () => {
  it("R15: a route handler refuses a form post from another site and nothing is written", async () => {
    const agent = await signIn("agent2@gradeline.test", "gradeline-demo");
    const before = await orderCount(agent.cookie);
    const crossSite: Record<string, string>[] = [{ origin: EVIL }, { "sec-fetch-site": "cross-site" }];
    for (const headers of crossSite) {
      const res = await fetch(`${base()}/api/orders`, {
        method: "POST",
        headers: { cookie: agent.cookie, "content-type": "text/plain", ...headers },
        body: JSON.stringify(orderBody(1)),
      });
      expect(res.status).toBe(403);
    }
    expect(await orderCount(agent.cookie)).toBe(before);
  });

  it("R15: next-auth's sign-out posted from another site without its CSRF token leaves the session working", async () => {
    const buyer = await signIn("buyer3@gradeline.test", "gradeline-demo");
    const res = await fetch(`${base()}/api/auth/signout`, {
      method: "POST",
      redirect: "manual",
      headers: { cookie: buyer.cookie, origin: EVIL, "content-type": "application/x-www-form-urlencoded" },
      body: "json=true",
    });
    expect(res.status).toBeLessThan(500);
    expect((await fetch(`${base()}/api/me`, { headers: { cookie: buyer.cookie } })).status).toBe(200);
  });
});
