import { invalid, missingParam, noSuch } from "../core/errors";
import { expand } from "../core/expand";
import { newId } from "../core/ids";
import { formatAmount } from "../core/money";
import type { ParamReader } from "../core/params";
import { expireSession, findSession } from "../core/sessions";
import type { CheckoutSession, LineItem } from "../types";
import type { ApiHandler, ApiRoute } from "./types";

const MIN_EXPIRY_SECONDS = 30 * 60;
const MAX_EXPIRY_SECONDS = 24 * 60 * 60;
const MIN_TOTAL = 50;
const MAX_TOTAL = 99_999_999;

function readLineItem(item: ParamReader): LineItem {
  item.allowOnly(["price", "price_data", "quantity"]);
  if (item.has("price")) {
    throw invalid("The local payment stand-in keeps no price catalog: pass price_data instead of price.", item.name("price"));
  }
  const priceData = item.object("price_data", { required: true }) as ParamReader;
  priceData.allowOnly(["currency", "product_data", "unit_amount"]);
  const currency = (priceData.string("currency", { required: true }) as string).toLowerCase();
  if (!/^[a-z]{3}$/.test(currency)) throw invalid(`Invalid currency: ${currency}`, priceData.name("currency"));
  const unitAmount = priceData.integer("unit_amount", { required: true, min: 0 }) as number;
  const product = priceData.object("product_data", { required: true }) as ParamReader;
  product.allowOnly(["description", "metadata", "name"]);
  const name = product.string("name", { required: true, max: 250 }) as string;
  product.metadata();
  const quantity = item.integer("quantity", { required: true, min: 1 }) as number;
  return {
    id: newId("li"),
    object: "item",
    amount_subtotal: unitAmount * quantity,
    amount_total: unitAmount * quantity,
    currency,
    description: name,
    price: { id: newId("price"), object: "price", currency, unit_amount: unitAmount, product: newId("prod") },
    quantity,
  };
}

const create: ApiHandler = (ctx, { params: p, expand: paths }) => {
  p.allowOnly([
    "cancel_url",
    "client_reference_id",
    "customer_email",
    "expand",
    "expires_at",
    "line_items",
    "metadata",
    "mode",
    "payment_intent_data",
    "payment_method_types",
    "success_url",
  ]);
  const mode = p.oneOf("mode", ["payment", "setup", "subscription"], { required: true });
  if (mode !== "payment") throw invalid("The local payment stand-in supports mode=payment only.", "mode");
  const items = p.objectList("line_items", { required: true }).map(readLineItem);
  if (items.length === 0) throw missingParam("line_items");
  const currency = items[0]?.currency ?? "usd";
  if (items.some((i) => i.currency !== currency)) throw invalid("All line items must use the same currency.", "line_items");
  const total = items.reduce((sum, i) => sum + i.amount_total, 0);
  if (total < MIN_TOTAL) {
    throw invalid(`The Checkout Session's total amount due must add up to at least ${formatAmount(MIN_TOTAL, currency)}.`, "line_items");
  }
  if (total > MAX_TOTAL)
    throw invalid(`The Checkout Session's total amount due must be at most ${formatAmount(MAX_TOTAL, currency)}.`, "line_items");
  const methods = p.stringList("payment_method_types");
  if (methods.some((m) => m !== "card")) throw invalid("The local payment stand-in supports card payments only.", "payment_method_types");

  const now = ctx.store.now();
  const expiresAt = p.integer("expires_at") ?? now + MAX_EXPIRY_SECONDS;
  if (expiresAt < now + MIN_EXPIRY_SECONDS) {
    throw invalid("The `expires_at` timestamp must be at least 30 minutes after Checkout Session creation.", "expires_at");
  }
  if (expiresAt > now + MAX_EXPIRY_SECONDS) {
    throw invalid("The `expires_at` timestamp must be less than 24 hours after Checkout Session creation.", "expires_at");
  }
  const pid = p.object("payment_intent_data")?.allowOnly(["description", "metadata", "transfer_group"]);

  const id = newId("cs_test");
  const session: CheckoutSession = {
    id,
    object: "checkout.session",
    amount_subtotal: total,
    amount_total: total,
    cancel_url: p.url("cancel_url") ?? null,
    client_reference_id: p.string("client_reference_id", { max: 200 }) ?? null,
    created: now,
    currency,
    customer: null,
    customer_details: null,
    customer_email: p.email("customer_email") ?? null,
    expires_at: expiresAt,
    livemode: false,
    metadata: p.metadata(),
    mode: "payment",
    payment_intent: null,
    payment_method_types: ["card"],
    payment_status: "unpaid",
    status: "open",
    success_url: p.url("success_url", { required: true }) as string,
    url: `${ctx.publicUrl()}/pay/${id}`,
  };
  const state = ctx.store.state;
  state.checkout_sessions[id] = session;
  state.line_items[id] = items;
  state.payment_intent_data[id] = {
    description: pid?.string("description", { max: 1000 }) ?? null,
    metadata: pid?.metadata() ?? {},
    transfer_group: pid?.string("transfer_group", { max: 5000 }) ?? null,
  };
  return expand(state, session, paths);
};

function mustFind(ctx: Parameters<ApiHandler>[0], id: string): CheckoutSession {
  const session = findSession(ctx, id);
  if (!session) throw noSuch("checkout.session", id);
  return session;
}

const retrieve: ApiHandler = (ctx, { params, path, expand: paths }) => {
  params.allowOnly(["expand"]);
  return expand(ctx.store.state, mustFind(ctx, path.id as string), paths);
};

const expire: ApiHandler = (ctx, { params, path, source, expand: paths }) => {
  params.allowOnly(["expand"]);
  const session = mustFind(ctx, path.id as string);
  if (session.status !== "open") {
    throw invalid(`Only Checkout Sessions with status "open" can be expired; this one is "${session.status}".`);
  }
  expireSession(ctx, session, source);
  return expand(ctx.store.state, session, paths);
};

const listLineItems: ApiHandler = (ctx, { params, path }) => {
  params.allowOnly(["ending_before", "expand", "limit", "starting_after"]);
  const session = mustFind(ctx, path.id as string);
  return {
    object: "list",
    data: ctx.store.state.line_items[session.id] ?? [],
    has_more: false,
    url: `/v1/checkout/sessions/${session.id}/line_items`,
  };
};

export const checkoutSessionRoutes: ApiRoute[] = [
  { method: "POST", pattern: "/v1/checkout/sessions", handler: create },
  { method: "GET", pattern: "/v1/checkout/sessions/:id", handler: retrieve },
  { method: "POST", pattern: "/v1/checkout/sessions/:id/expire", handler: expire },
  { method: "GET", pattern: "/v1/checkout/sessions/:id/line_items", handler: listLineItems },
];
