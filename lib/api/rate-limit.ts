import "server-only";

import { RateLimiterMemory, RateLimiterRes } from "rate-limiter-flexible";

import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";

const g = globalThis as unknown as { __gradelineLimiters?: Map<string, RateLimiterMemory> };

const LIMITS = {
  "upload-sign": () => [env().UPLOAD_SIGN_LIMIT, env().UPLOAD_SIGN_LIMIT_WINDOW_SECONDS],
  checkout: () => [env().CHECKOUT_LIMIT, env().CHECKOUT_LIMIT_WINDOW_SECONDS],
} as const;

/** A per-user limit for costly actions (checkout creation, upload signing): 429 with Retry-After past it. */
export async function limitPerUser(name: keyof typeof LIMITS, userId: string): Promise<void> {
  const [points, durationSeconds] = LIMITS[name]();
  g.__gradelineLimiters ??= new Map();
  let limiter = g.__gradelineLimiters.get(name);
  if (!limiter) {
    limiter = new RateLimiterMemory({ keyPrefix: name, points, duration: durationSeconds });
    g.__gradelineLimiters.set(name, limiter);
  }
  try {
    await limiter.consume(userId);
  } catch (error) {
    if (!(error instanceof RateLimiterRes)) throw error;
    const seconds = Math.max(1, Math.ceil(error.msBeforeNext / 1000));
    throw new AppError("rate_limited", `Too many attempts. Try again in ${seconds} seconds.`, undefined, {
      "Retry-After": String(seconds),
    });
  }
}
