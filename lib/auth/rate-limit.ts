import { RateLimiterMemory, RateLimiterRes } from "rate-limiter-flexible";

import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";

type Limiters = { account: RateLimiterMemory; address: RateLimiterMemory };
const g = globalThis as unknown as { __gradelineSignInLimits?: Limiters };

function limiters(): Limiters {
  const e = env();
  g.__gradelineSignInLimits ??= {
    account: new RateLimiterMemory({ keyPrefix: "signin-account", points: e.AUTH_LIMIT_PER_ACCOUNT, duration: e.AUTH_LIMIT_WINDOW_SECONDS }),
    address: new RateLimiterMemory({ keyPrefix: "signin-address", points: e.AUTH_LIMIT_PER_ADDRESS, duration: e.AUTH_LIMIT_WINDOW_SECONDS }),
  };
  return g.__gradelineSignInLimits;
}

function tooMany(res: RateLimiterRes): AppError {
  const seconds = Math.max(1, Math.ceil(res.msBeforeNext / 1000));
  return new AppError("rate_limited", `Too many sign-in attempts. Try again in ${seconds} seconds.`, undefined, {
    "Retry-After": String(seconds),
  });
}

/** Counts one sign-in attempt for the account and for the address; throws a 429 AppError past either limit. */
export async function consumeSignInAttempt(email: string, address: string): Promise<void> {
  const l = limiters();
  try {
    await l.address.consume(address);
    await l.account.consume(email.trim().toLowerCase());
  } catch (error) {
    if (error instanceof RateLimiterRes) throw tooMany(error);
    throw error;
  }
}

export async function clearSignInAttempts(email: string): Promise<void> {
  await limiters().account.delete(email.trim().toLowerCase());
}
