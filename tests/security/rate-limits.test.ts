// R13: per-user limits on upload signing and checkout creation (the sign-in limit is tried
// against the running app in tests/server/auth.test.ts).
import { describe, expect, it } from "vitest";

import { GET as listParts } from "@/app/api/clips/[clipId]/parts/route";
import { POST as startClip } from "@/app/api/jobs/[id]/clips/route";
import { POST as checkout } from "@/app/api/reports/[id]/checkout/route";
import { env } from "@/lib/env";

import { acceptedJob } from "../uploads/support/harness";
import { call } from "../utils/session";
import { deliveredReport } from "../utils/world";

const clipBody = (n: number) => ({ fileName: `run-${n}.mp4`, sizeBytes: 1_000_000, contentType: "video/mp4" });

describe("R13 rate limits on costly requests", () => {
  it("R13: 100 upload-signing requests in a minute from one inspector get 429 with Retry-After past the limit; another inspector is unaffected", async () => {
    const limit = env().UPLOAD_SIGN_LIMIT;
    expect(limit).toBeLessThan(100);
    const a = await acceptedJob();
    const b = await acceptedJob();
    const statuses: number[] = [];
    let clipId = "";
    let retryAfter: string | null = null;
    const started = Date.now();
    for (let i = 0; i < 100 && Date.now() - started < 50_000; i++) {
      // Half start clips (POST /api/jobs/{id}/clips), half ask for part URLs (GET /api/clips/{id}/parts).
      const res =
        i % 2 === 0 || !clipId
          ? await call(startClip, { method: "POST", params: { id: a.jobId }, body: clipBody(i), cookie: a.inspector.cookie })
          : await call(listParts, { params: { clipId }, cookie: a.inspector.cookie });
      if (res.status === 201) clipId = res.json.clipId as string;
      if (res.status === 429) retryAfter = res.headers.get("retry-after");
      statuses.push(res.status);
    }
    expect(statuses).toHaveLength(100);
    expect(statuses.slice(0, limit).every((s) => s === 200 || s === 201)).toBe(true);
    expect(statuses.slice(limit).every((s) => s === 429)).toBe(true);
    expect(Number(retryAfter)).toBeGreaterThan(0);
    expect(Number(retryAfter)).toBeLessThanOrEqual(env().UPLOAD_SIGN_LIMIT_WINDOW_SECONDS);

    const other = await call(startClip, { method: "POST", params: { id: b.jobId }, body: clipBody(0), cookie: b.inspector.cookie });
    expect(other.status).toBe(201);
  });

  it("R13: repeated checkout creation by one buyer gets 429 with Retry-After past the limit; another buyer still checks out", async () => {
    const limit = env().CHECKOUT_LIMIT;
    const report = await deliveredReport();
    const otherReport = await deliveredReport();
    const statuses: number[] = [];
    let res;
    for (let i = 0; i < limit + 3; i++) {
      res = await call(checkout, { method: "POST", params: { id: report.id }, cookie: report.buyer.cookie });
      statuses.push(res.status);
    }
    expect(statuses).toEqual([...Array(limit).fill(200), 429, 429, 429]);
    expect(Number(res!.headers.get("retry-after"))).toBeGreaterThan(0);
    expect(res!.json.error?.code).toBe("rate_limited");

    const other = await call(checkout, { method: "POST", params: { id: otherReport.id }, cookie: otherReport.buyer.cookie });
    expect(other.status).toBe(200);
    expect(other.json.url).toMatch(/\/pay\//);
  });
});
