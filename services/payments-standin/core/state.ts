import type {
  Account,
  AccountLinkRecord,
  Charge,
  CheckoutSession,
  EventRecord,
  IdempotencyRecord,
  LineItem,
  PaymentIntent,
  PaymentIntentData,
  Refund,
  Transfer,
} from "../types";

export interface StandinState {
  version: 1;
  /** Seconds added to the wall clock; moved forward by POST /_standin/advance-clock. */
  clock_offset: number;
  checkout_sessions: Record<string, CheckoutSession>;
  line_items: Record<string, LineItem[]>;
  payment_intent_data: Record<string, PaymentIntentData>;
  payment_intents: Record<string, PaymentIntent>;
  charges: Record<string, Charge>;
  refunds: Record<string, Refund>;
  accounts: Record<string, Account>;
  account_links: Record<string, AccountLinkRecord>;
  transfers: Record<string, Transfer>;
  events: EventRecord[];
  idempotency: Record<string, IdempotencyRecord>;
}

export function emptyState(): StandinState {
  return {
    version: 1,
    clock_offset: 0,
    checkout_sessions: {},
    line_items: {},
    payment_intent_data: {},
    payment_intents: {},
    charges: {},
    refunds: {},
    accounts: {},
    account_links: {},
    transfers: {},
    events: [],
    idempotency: {},
  };
}
