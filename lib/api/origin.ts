import type { NextRequest } from "next/server";

import { appUrl } from "@/lib/env";
import { AppError } from "@/lib/errors";

/** Refuses state-changing requests that come from another site (cookies ride along on those). */
export function checkSameOrigin(req: NextRequest): void {
  const origin = req.headers.get("origin");
  if (origin) {
    const allowed = new Set([new URL(appUrl()).origin, req.nextUrl.origin]);
    const host = req.headers.get("x-forwarded-host") ?? req.headers.get("host");
    if (host) allowed.add(`${req.nextUrl.protocol}//${host}`);
    if (!allowed.has(origin)) throw new AppError("forbidden", "Cross-site requests are refused.");
    return;
  }
  if (req.headers.get("sec-fetch-site") === "cross-site") throw new AppError("forbidden", "Cross-site requests are refused.");
}
