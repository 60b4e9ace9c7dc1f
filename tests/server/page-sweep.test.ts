// R12 for pages: every page of the app, read from the app folder, requested by each role that may not
// see it and with the ids of objects the caller may not touch. Each answer is a 404 (signed-out
// visitors are sent to sign in), never a 5xx, and none carries the other user's address.
import fs from "node:fs";
import path from "node:path";

import { beforeAll, describe, expect, it } from "vitest";

import { base, signIn } from "../utils/http-session";

const APP = path.join(process.cwd(), "app");
const PASSWORD = "gradeline-demo";
type Role = "agent" | "inspector" | "buyer" | "admin";

type Page = { route: string; roles: Role[]; file: string };

/** Every page.tsx under app/, its URL pattern (route groups dropped) and the roles its requireUser() lets in. */
function pages(dir = APP): Page[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    if (e.isDirectory()) return pages(full);
    if (e.name !== "page.tsx") return [];
    const route =
      "/" +
      path
        .relative(APP, dir)
        .split(path.sep)
        .filter((s) => s && !/^\(.*\)$/.test(s))
        .join("/");
    const call = /requireUser\(([^)]*)\)/.exec(fs.readFileSync(full, "utf8"));
    const roles = call ? ([...call[1].matchAll(/"(\w+)"/g)].map((m) => m[1]) as Role[]) : [];
    return [{ route, roles, file: path.relative(process.cwd(), full) }];
  });
}

const fill = (route: string, ids: Record<string, string>) => route.replace(/\[(\w+)\]/g, (_, k: string) => encodeURIComponent(ids[k] ?? `missing-${k}`));

type Answer = { status: number; location: string | null; body: string };
async function get(url: string, cookie: string | null): Promise<Answer> {
  const res = await fetch(`${base()}${url}`, { headers: cookie ? { cookie } : {}, redirect: "manual" });
  return { status: res.status, location: res.headers.get("location"), body: await res.text() };
}

const USERS = {
  agent: "agent@gradeline.test",
  agent2: "agent2@gradeline.test",
  inspector: "inspector@gradeline.test",
  inspector2: "inspector2@gradeline.test",
  inspector3: "inspector3@gradeline.test",
  buyer: "buyer@gradeline.test",
  buyer2: "buyer2@gradeline.test",
  buyer3: "buyer3@gradeline.test",
  admin: "admin@gradeline.test",
} as const;
type Who = keyof typeof USERS;
const roleOf = (who: Who): Role => who.replace(/\d$/, "") as Role;

// Ids that are not ids: each must be a plain 404, never an error page.
const MALFORMED = ["not-a-uuid", "00000000-0000-0000-0000-000000000000", "..%2F..%2Fapi%2Fhealth", "x".repeat(300), "1'%20or%20'1'%3D'1"];

describe("the page sweep", () => {
  const all = pages();
  const cookies = {} as Record<Who, string>;
  // One delivered-or-unlocked order of agent@: its order, job and report pages are the victims.
  let victim: { id: string; street: string; inspector: Who; buyersWithout: Who[] };

  beforeAll(async () => {
    for (const who of Object.keys(USERS) as Who[]) {
      const session = await signIn(USERS[who], PASSWORD);
      expect(session.signedIn, USERS[who]).toBe(true);
      cookies[who] = session.cookie;
    }
    const list = (await (await fetch(`${base()}/api/orders?pageSize=100`, { headers: { cookie: cookies.agent } })).json()) as {
      orders: { id: string; status: string; address: { street: string }; inspector: { id: string } | null }[];
    };
    const reportsOf = {} as Record<Who, string[]>;
    for (const who of ["buyer", "buyer2", "buyer3"] as const) {
      const reports = (await (await fetch(`${base()}/api/reports`, { headers: { cookie: cookies[who] } })).json()) as { reports: { id: string }[] };
      reportsOf[who] = reports.reports.map((r) => r.id);
    }
    const order = list.orders.find((o) => (o.status === "delivered" || o.status === "unlocked") && o.inspector && reportsOf.buyer.includes(o.id));
    if (!order) throw new Error("the demo world has no delivered order of agent@ for buyer@ to sweep with");
    let inspector: Who | undefined;
    for (const who of ["inspector", "inspector2", "inspector3"] as const) {
      const jobs = (await (await fetch(`${base()}/api/jobs?assigned=me`, { headers: { cookie: cookies[who] } })).json()) as { jobs: { id: string }[] };
      if (jobs.jobs.some((j) => j.id === order.id)) inspector = who;
    }
    const buyersWithout = (["buyer2", "buyer3"] as const).filter((b) => !reportsOf[b].includes(order.id));
    expect(inspector, "the victim order's inspector").toBeDefined();
    expect(buyersWithout.length, "buyers not invited to the victim report").toBeGreaterThan(0);
    victim = { id: order.id, street: order.address.street, inspector: inspector!, buyersWithout };
  });

  it("finds the app's pages by reading the app folder, and knows who may open each", () => {
    const routes = all.map((p) => p.route);
    expect(routes).toEqual(expect.arrayContaining(["/orders/[id]", "/jobs/[id]/work", "/reports/[id]", "/admin/orders/[id]", "/s/[token]"]));
    // A new page with an id in its path must be added to the owners below, or this fails.
    for (const p of all.filter((p) => p.route.includes("["))) expect(Object.keys(OWNERS), p.file).toContain(p.route);
  });

  // Who owns the victim's object on each page with an id; everyone else of the page's role is swept with it.
  const OWNERS: Record<string, (v: typeof victim) => Who[]> = {
    "/orders/[id]": () => ["agent"],
    "/jobs/[id]": (v) => [v.inspector],
    "/jobs/[id]/work": (v) => [v.inspector],
    "/reports/[id]": (v) => (["buyer", "buyer2", "buyer3"] as Who[]).filter((b) => !v.buyersWithout.includes(b)),
    "/admin/orders/[id]": () => ["admin"],
    "/s/[token]": () => [],
  };

  it("answers 404 to every signed-in role a page is not for, and sends signed-out visitors to sign in", async () => {
    const failures: string[] = [];
    for (const p of all.filter((p) => p.roles.length > 0)) {
      const url = fill(p.route, { id: victim.id });
      const out = await get(url, null);
      if (out.status < 300 || out.status >= 400 || !out.location?.includes("/sign-in")) failures.push(`signed out ${url}: ${out.status} ${out.location}`);
      for (const who of Object.keys(USERS) as Who[]) {
        if (p.roles.includes(roleOf(who))) continue;
        const res = await get(url, cookies[who]);
        if (res.status !== 404) failures.push(`${who} ${url}: ${res.status}`);
        if (res.body.includes(victim.street)) failures.push(`${who} ${url}: the page carries ${victim.street}`);
      }
    }
    expect(failures).toEqual([]);
  });

  it("answers 404 to a caller of the right role who does not own the object, with nothing of it in the page", async () => {
    const failures: string[] = [];
    let swept = 0;
    for (const p of all.filter((p) => p.route.includes("[") && p.roles.length > 0)) {
      const url = fill(p.route, { id: victim.id });
      const owners = OWNERS[p.route](victim);
      const owner = await get(url, cookies[owners[0]]);
      // The owner's answer proves the id is real, so the 404s below are about ownership.
      if (owner.status !== 200 || !owner.body.includes(victim.street)) failures.push(`owner ${owners[0]} ${url}: ${owner.status}`);
      for (const who of (Object.keys(USERS) as Who[]).filter((w) => p.roles.includes(roleOf(w)) && !owners.includes(w))) {
        swept++;
        const res = await get(url, cookies[who]);
        if (res.status !== 404) failures.push(`${who} ${url}: ${res.status}`);
        if (res.body.includes(victim.street)) failures.push(`${who} ${url}: the page carries ${victim.street}`);
      }
    }
    expect(failures).toEqual([]);
    expect(swept).toBeGreaterThanOrEqual(4);
  });

  it("answers 404, never 5xx, to ids that are not ids, for the page's own role", async () => {
    const failures: string[] = [];
    for (const p of all.filter((p) => p.route.includes("["))) {
      const who = (Object.keys(USERS) as Who[]).find((w) => p.roles.length === 0 || p.roles.includes(roleOf(w)))!;
      for (const bad of MALFORMED) {
        const url = p.route.replace(/\[(\w+)\]/g, bad);
        const res = await get(url, p.roles.length ? cookies[who] : null);
        if (res.status !== 404) failures.push(`${who} ${url.slice(0, 80)}: ${res.status}`);
      }
    }
    expect(failures).toEqual([]);
  });

  it("keeps the bench's fixed-data page shut unless the server was started for the bench", async () => {
    expect((await get("/bench/orders-fixed", null)).status).toBe(404);
    expect((await get("/bench/orders-fixed", cookies.admin)).status).toBe(404);
  });
});
