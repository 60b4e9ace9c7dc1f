import { newId } from "../core/ids";
import type { Store } from "../core/store";
import type { ApiObject, EventRecord } from "../types";
import { deliverWithRetries, type DeliveryOptions } from "./deliver";
import { STANDIN_API_VERSION } from "./sign";

export interface EventSource {
  requestId: string | null;
  idempotencyKey: string | null;
}

export const AUTOMATIC: EventSource = { requestId: null, idempotencyKey: null };

export interface EmitResult {
  record: EventRecord;
  /** Settles after the first delivery attempt; retries go on in the background. */
  firstAttempt: Promise<void>;
}

/** Records events and sends each one to the webhook endpoint, if one is configured. */
export class EventBus {
  private readonly controller = new AbortController();
  private readonly pending = new Set<Promise<void>>();

  constructor(
    private readonly store: Store,
    private readonly delivery: Omit<DeliveryOptions, "signal">,
  ) {}

  emit(type: string, object: ApiObject, source: EventSource, previous?: Record<string, unknown>): EmitResult {
    const record: EventRecord = {
      event: {
        id: newId("evt"),
        object: "event",
        api_version: STANDIN_API_VERSION,
        created: this.store.now(),
        // A snapshot, as the live API sends: later changes to the object don't alter the event.
        data: { object: structuredClone(object), ...(previous ? { previous_attributes: previous } : {}) },
        livemode: false,
        pending_webhooks: this.delivery.url ? 1 : 0,
        request: { id: source.requestId, idempotency_key: source.idempotencyKey },
        type,
      },
      delivery: {
        status: this.delivery.url ? "pending" : "no_endpoint",
        attempts: 0,
        last_attempt_at: null,
        last_status_code: null,
        last_error: null,
      },
    };
    this.store.state.events.push(record);
    return { record, firstAttempt: this.send(record, this.delivery.attempts) };
  }

  /** Sends a recorded event again (one attempt) and resolves when that attempt is done. */
  async resend(record: EventRecord): Promise<void> {
    if (!this.delivery.url) return;
    record.delivery.status = "pending";
    await this.send(record, 1);
  }

  find(eventId: string): EventRecord | undefined {
    return this.store.state.events.find((r) => r.event.id === eventId);
  }

  async close(): Promise<void> {
    this.controller.abort();
    await Promise.allSettled([...this.pending]);
  }

  private send(record: EventRecord, attempts: number): Promise<void> {
    if (!this.delivery.url) return Promise.resolve();
    let markFirst: () => void = () => {};
    const firstAttempt = new Promise<void>((resolve) => (markFirst = resolve));
    const run = deliverWithRetries(record, { ...this.delivery, attempts, signal: this.controller.signal }, () => {
      markFirst();
      this.store.persist();
    }).finally(() => {
      markFirst();
      this.pending.delete(run);
    });
    this.pending.add(run);
    return firstAttempt;
  }
}
