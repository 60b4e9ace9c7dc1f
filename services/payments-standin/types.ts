export type Metadata = Record<string, string>;

export interface LineItem {
  id: string;
  object: "item";
  amount_subtotal: number;
  amount_total: number;
  currency: string;
  description: string;
  price: { id: string; object: "price"; currency: string; unit_amount: number; product: string };
  quantity: number;
}

export interface CheckoutSession {
  id: string;
  object: "checkout.session";
  amount_subtotal: number;
  amount_total: number;
  cancel_url: string | null;
  client_reference_id: string | null;
  created: number;
  currency: string;
  customer: null;
  customer_details: { email: string | null } | null;
  customer_email: string | null;
  expires_at: number;
  livemode: false;
  metadata: Metadata;
  mode: "payment";
  payment_intent: string | null;
  payment_method_types: string[];
  payment_status: "unpaid" | "paid";
  status: "open" | "complete" | "expired";
  success_url: string;
  url: string | null;
}

/** What Checkout copies onto the PaymentIntent it creates at payment time. */
export interface PaymentIntentData {
  description: string | null;
  metadata: Metadata;
  transfer_group: string | null;
}

export interface PaymentError {
  type: "card_error";
  code: string;
  decline_code: string | null;
  message: string;
}

export interface PaymentIntent {
  id: string;
  object: "payment_intent";
  amount: number;
  amount_capturable: number;
  amount_received: number;
  created: number;
  currency: string;
  customer: null;
  description: string | null;
  last_payment_error: PaymentError | null;
  latest_charge: string | null;
  livemode: false;
  metadata: Metadata;
  payment_method: string | null;
  payment_method_types: string[];
  receipt_email: string | null;
  status: "requires_payment_method" | "succeeded";
  transfer_group: string | null;
}

export interface CardDetails {
  brand: string;
  country: string;
  exp_month: number;
  exp_year: number;
  funding: "credit";
  last4: string;
}

export interface Charge {
  id: string;
  object: "charge";
  amount: number;
  amount_captured: number;
  amount_refunded: number;
  billing_details: { email: string | null; name: string | null };
  captured: boolean;
  created: number;
  currency: string;
  description: string | null;
  livemode: false;
  metadata: Metadata;
  paid: boolean;
  payment_intent: string;
  payment_method: string;
  payment_method_details: { type: "card"; card: CardDetails };
  receipt_email: string | null;
  refunded: boolean;
  status: "succeeded";
  transfer_group: string | null;
}

export interface Refund {
  id: string;
  object: "refund";
  amount: number;
  charge: string;
  created: number;
  currency: string;
  metadata: Metadata;
  payment_intent: string;
  reason: "duplicate" | "fraudulent" | "requested_by_customer" | null;
  status: "succeeded";
}

export type CapabilityStatus = "active" | "inactive" | "pending";

export interface Account {
  id: string;
  object: "account";
  business_type: string | null;
  capabilities: { card_payments: CapabilityStatus; transfers: CapabilityStatus };
  charges_enabled: boolean;
  country: string;
  created: number;
  default_currency: string;
  details_submitted: boolean;
  email: string | null;
  metadata: Metadata;
  payouts_enabled: boolean;
  requirements: {
    currently_due: string[];
    disabled_reason: string | null;
    eventually_due: string[];
    past_due: string[];
  };
  type: "express" | "standard" | "custom";
}

export interface AccountLink {
  object: "account_link";
  created: number;
  expires_at: number;
  url: string;
}

/** The stand-in's own record behind an account link URL. */
export interface AccountLinkRecord {
  id: string;
  account: string;
  expires_at: number;
  refresh_url: string | null;
  return_url: string | null;
  type: "account_onboarding" | "account_update";
  used: boolean;
}

export interface TransferReversal {
  id: string;
  object: "transfer_reversal";
  amount: number;
  created: number;
  currency: string;
  destination_payment_refund: string;
  metadata: Metadata;
  source_refund: null;
  transfer: string;
}

export interface ApiList<T> {
  object: "list";
  data: T[];
  has_more: boolean;
  total_count?: number;
  url: string;
}

export interface Transfer {
  id: string;
  object: "transfer";
  amount: number;
  amount_reversed: number;
  created: number;
  currency: string;
  description: string | null;
  destination: string;
  destination_payment: string;
  livemode: false;
  metadata: Metadata;
  reversals: ApiList<TransferReversal>;
  reversed: boolean;
  source_transaction: string | null;
  source_type: "card";
  transfer_group: string | null;
}

export type ApiObject = CheckoutSession | PaymentIntent | Charge | Refund | Account | Transfer | TransferReversal;

export interface StandinEvent {
  id: string;
  object: "event";
  api_version: string;
  created: number;
  data: { object: ApiObject; previous_attributes?: Record<string, unknown> };
  livemode: false;
  pending_webhooks: number;
  request: { id: string | null; idempotency_key: string | null };
  type: string;
}

export type DeliveryStatus = "pending" | "delivered" | "failed" | "no_endpoint";

export interface EventRecord {
  event: StandinEvent;
  delivery: {
    status: DeliveryStatus;
    attempts: number;
    last_attempt_at: number | null;
    last_status_code: number | null;
    last_error: string | null;
  };
}

export interface IdempotencyRecord {
  method: string;
  path: string;
  params_fingerprint: string;
  status: number;
  body: unknown;
  created: number;
}
