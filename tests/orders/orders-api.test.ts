import { count } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { GET as getOrder } from "@/app/api/orders/[id]/route";
import { POST as quote } from "@/app/api/orders/quote/route";
import { GET as listOrders, POST as createOrder } from "@/app/api/orders/route";
import { getDb } from "@/db/client";
import { listings, mailOutbox, orders } from "@/db/schema";

import { call } from "../utils/session";
import { orderInput, signedIn, verifiedInspector } from "../utils/world";

const countRows = async () => {
  const db = await getDb();
  const [[o], [l], [m]] = await Promise.all([db.select({ n: count() }).from(orders), db.select({ n: count() }).from(listings), db.select({ n: count() }).from(mailOutbox)]);
  return { orders: o.n, listings: l.n, mail: m.n };
};

describe("POST /api/orders", async () => {
  await verifiedInspector(["97991"]);
  const agent = await signedIn("agent");

  it("creates an open order with its price and the same address", async () => {
    const input = orderInput();
    const res = await call(createOrder, { method: "POST", path: "/api/orders", body: input, cookie: agent.cookie });
    expect(res.status).toBe(201);
    expect(res.json).toMatchObject({ status: "open", priceCents: 32500, address: { ...input.address, unit: null } });
    expect(res.json.id).toMatch(/^[0-9a-f-]{36}$/);
  });

  it("adds the no-cleanout and rush add-ons from the price table", async () => {
    const soon = new Date(Date.now() + 30 * 3_600_000).toISOString();
    const input = orderInput({ cleanoutKnown: false, cleanoutNote: undefined, deadline: soon, visitWindows: [{ start: new Date(Date.now() + 3_600_000).toISOString(), end: new Date(Date.now() + 5 * 3_600_000).toISOString() }] });
    const res = await call(createOrder, { method: "POST", path: "/api/orders", body: input, cookie: agent.cookie });
    expect(res.status).toBe(201);
    expect(res.json.priceCents).toBe(32500 + 7500 + 9500);
  });

  it.each([
    ["a deadline in the past", { deadline: new Date(Date.now() - 3_600_000).toISOString() }, "deadline", /passed/],
    ["a postal code nobody serves", { address: { street: "1 Nowhere Road", city: "Harrow Falls", state: "OR", postalCode: "97999" } }, "address.postalCode", /No verified inspector serves 97999/],
    ["a missing buyer e-mail", { buyer: { name: "Kai Morrow", email: "" } }, "buyer.email", /invitation/],
    ["a window that ends before it starts", { visitWindows: [{ start: new Date(Date.now() + 9 * 3_600_000).toISOString(), end: new Date(Date.now() + 8 * 3_600_000).toISOString() }] }, "visitWindows[0].end", /end after/],
  ])("refuses %s with a message on the field and changes nothing", async (_label, patch, field, message) => {
    const before = await countRows();
    const res = await call(createOrder, { method: "POST", path: "/api/orders", body: { ...orderInput(), ...patch }, cookie: agent.cookie });
    expect(res.status).toBe(400);
    expect(res.json.error?.fieldErrors?.[field]?.join(" ")).toMatch(message);
    expect(await countRows()).toEqual(before);
  });

  it("refuses unknown fields", async () => {
    const res = await call(createOrder, { method: "POST", path: "/api/orders", body: { ...orderInput(), priceCents: 1 }, cookie: agent.cookie });
    expect(res.status).toBe(400);
  });

  it.each(["inspector", "buyer", "admin"] as const)("answers 403 to a signed-in %s", async (role) => {
    const other = await signedIn(role);
    const res = await call(createOrder, { method: "POST", path: "/api/orders", body: orderInput(), cookie: other.cookie });
    expect(res.status).toBe(403);
  });

  it("answers 401 when signed out", async () => {
    expect((await call(createOrder, { method: "POST", path: "/api/orders", body: orderInput() })).status).toBe(401);
  });
});

describe("GET /api/orders and /api/orders/{id}", async () => {
  await verifiedInspector(["97991"]);
  const a = await signedIn("agent");
  const b = await signedIn("agent");
  const admin = await signedIn("admin");
  const mine = await call(createOrder, { method: "POST", path: "/api/orders", body: orderInput({ address: { street: "12 Kilnworks Lane", city: "Harrow Falls", state: "OR", postalCode: "97991" } }), cookie: a.cookie });
  await call(createOrder, { method: "POST", path: "/api/orders", body: orderInput(), cookie: b.cookie });
  const id = mine.json.id as string;

  it("lists only the agent's own orders", async () => {
    const res = await call(listOrders, { path: "/api/orders", cookie: a.cookie });
    expect(res.status).toBe(200);
    expect((res.json.orders as { id: string }[]).map((o) => o.id)).toEqual([id]);
  });

  it("lists every order for an admin, with paging", async () => {
    const res = await call(listOrders, { path: "/api/orders?pageSize=1&page=2", cookie: admin.cookie });
    expect(res.json.total).toBeGreaterThanOrEqual(2);
    expect(res.json.orders).toHaveLength(1);
    expect(res.json.page).toBe(2);
  });

  it("searches by address and filters by state", async () => {
    expect(((await call(listOrders, { path: "/api/orders?q=kilnworks", cookie: a.cookie })).json.orders as unknown[]).length).toBe(1);
    expect(((await call(listOrders, { path: "/api/orders?q=tannery", cookie: a.cookie })).json.orders as unknown[]).length).toBe(0);
    expect(((await call(listOrders, { path: "/api/orders?status=scheduled", cookie: a.cookie })).json.orders as unknown[]).length).toBe(0);
  });

  it("answers 400 to a bad query", async () => {
    expect((await call(listOrders, { path: "/api/orders?sort=nonsense", cookie: a.cookie })).status).toBe(400);
  });

  it("shows the order to its agent and an admin, and 404 to another agent or inspector", async () => {
    const other = await verifiedInspector(["97991"]);
    expect((await call(getOrder, { params: { id }, cookie: a.cookie })).status).toBe(200);
    expect((await call(getOrder, { params: { id }, cookie: admin.cookie })).status).toBe(200);
    expect((await call(getOrder, { params: { id }, cookie: b.cookie })).status).toBe(404);
    expect((await call(getOrder, { params: { id }, cookie: other.cookie })).status).toBe(404);
    expect((await call(getOrder, { params: { id: "not-a-uuid" }, cookie: a.cookie })).status).toBe(400);
  });

  it("records the order's first state in its timeline", async () => {
    const res = await call(getOrder, { params: { id }, cookie: a.cookie });
    expect(res.json.events).toEqual([expect.objectContaining({ from: null, to: "open", by: { name: a.user.name, role: "agent" } })]);
  });
});

describe("POST /api/orders/quote", async () => {
  await verifiedInspector(["97991"]);
  const agent = await signedIn("agent");
  it("prices the scope and says whether anyone serves the postal code", async () => {
    const deadline = new Date(Date.now() + 5 * 24 * 3_600_000).toISOString();
    const served = await call(quote, { method: "POST", body: { postalCode: "97991", cleanoutKnown: true, buildingSewers: 2, deadline }, cookie: agent.cookie });
    expect(served.json).toMatchObject({ served: true, priceCents: 32500 + 15000, inspectorPayoutCents: Math.round((32500 + 15000) * 0.8) });
    const nobody = await call(quote, { method: "POST", body: { postalCode: "97999", cleanoutKnown: true, buildingSewers: 1, deadline }, cookie: agent.cookie });
    expect(nobody.json.served).toBe(false);
  });
});
