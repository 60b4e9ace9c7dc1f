import type { EventRecord } from "../types";
import { signPayload } from "./sign";

export interface DeliveryOptions {
  url?: string;
  secret: string;
  attempts: number;
  baseDelayMs: number;
  timeoutMs: number;
  signal: AbortSignal;
}

/** POSTs the event, retrying failures with doubling delays, at most `attempts` times in all. */
export async function deliverWithRetries(record: EventRecord, opts: DeliveryOptions, afterAttempt: () => void): Promise<void> {
  if (!opts.url) return;
  const payload = JSON.stringify(record.event, null, 2);
  for (let attempt = 1; attempt <= opts.attempts; attempt++) {
    if (opts.signal.aborted) return;
    const ok = await attemptOnce(record, payload, opts);
    if (ok) record.delivery.status = "delivered";
    else if (attempt === opts.attempts) record.delivery.status = "failed";
    afterAttempt();
    if (ok) return;
    if (attempt < opts.attempts && !(await sleep(opts.baseDelayMs * 2 ** (attempt - 1), opts.signal))) return;
  }
}

async function attemptOnce(record: EventRecord, payload: string, opts: DeliveryOptions): Promise<boolean> {
  const { delivery } = record;
  delivery.attempts += 1;
  delivery.last_attempt_at = Math.floor(Date.now() / 1000);
  try {
    const response = await fetch(opts.url as string, {
      method: "POST",
      headers: {
        "Content-Type": "application/json; charset=utf-8",
        "Stripe-Signature": signPayload(payload, opts.secret),
        "User-Agent": "Gradeline-Payments-Standin/1.0",
      },
      body: payload,
      signal: AbortSignal.any([opts.signal, AbortSignal.timeout(opts.timeoutMs)]),
    });
    await response.arrayBuffer().catch(() => undefined);
    delivery.last_status_code = response.status;
    delivery.last_error = response.ok ? null : `HTTP ${response.status}`;
    return response.ok;
  } catch (err) {
    delivery.last_status_code = null;
    delivery.last_error = err instanceof Error ? (err.cause instanceof Error ? err.cause.message : err.message) : String(err);
    return false;
  }
}

function sleep(ms: number, signal: AbortSignal): Promise<boolean> {
  return new Promise((resolve) => {
    if (signal.aborted) return resolve(false);
    const timer = setTimeout(() => {
      signal.removeEventListener("abort", onAbort);
      resolve(true);
    }, ms);
    const onAbort = () => {
      clearTimeout(timer);
      resolve(false);
    };
    signal.addEventListener("abort", onAbort, { once: true });
  });
}
