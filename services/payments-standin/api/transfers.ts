import { availableBalance, sourceRemaining } from "../core/balance";
import { ApiError, invalid, noSuch } from "../core/errors";
import { expand } from "../core/expand";
import { newId } from "../core/ids";
import { formatAmount } from "../core/money";
import type { Transfer, TransferReversal } from "../types";
import type { ApiHandler, ApiRoute } from "./types";

type Ctx = Parameters<ApiHandler>[0];

function checkDestination(ctx: Ctx, destination: string): void {
  const account = ctx.store.state.accounts[destination];
  if (!account)
    throw new ApiError(400, "invalid_request_error", `No such destination: '${destination}'`, "resource_missing", "destination");
  if (!account.payouts_enabled || account.capabilities.transfers !== "active") {
    throw new ApiError(
      400,
      "invalid_request_error",
      `The destination account ${destination} cannot receive transfers yet: it has not finished onboarding (transfers capability inactive, payouts disabled).`,
      "insufficient_capabilities_for_transfer",
      "destination",
    );
  }
}

function checkFunds(ctx: Ctx, amount: number, currency: string, source: string | undefined): void {
  const state = ctx.store.state;
  if (source) {
    const charge = state.charges[source];
    if (!charge) throw noSuch("charge", source, "source_transaction");
    if (charge.currency !== currency) {
      throw invalid(
        `The currency of source_transaction's balance transaction (${charge.currency}) must be the same as the transfer currency (${currency}).`,
        "currency",
      );
    }
    const left = sourceRemaining(state, source);
    if (amount > left) {
      throw invalid(
        `Transfer amount (${formatAmount(amount, currency)}) exceeds what is left of source transaction ${source} (${formatAmount(left, currency)}).`,
        "amount",
        "amount_too_large",
      );
    }
    return;
  }
  const available = availableBalance(state, currency);
  if (amount > available) {
    throw new ApiError(
      400,
      "invalid_request_error",
      `Insufficient available funds: the platform balance is ${formatAmount(available, currency)}. Pass source_transaction to tie the transfer to the charge that funds it.`,
      "balance_insufficient",
    );
  }
}

function mustFind(ctx: Ctx, id: string): Transfer {
  const transfer = ctx.store.state.transfers[id];
  if (!transfer) throw noSuch("transfer", id);
  return transfer;
}

const create: ApiHandler = (ctx, { params: p, source, expand: paths }) => {
  p.allowOnly(["amount", "currency", "description", "destination", "expand", "metadata", "source_transaction", "transfer_group"]);
  const amount = p.integer("amount", { required: true, min: 1 }) as number;
  const currency = (p.string("currency", { required: true }) as string).toLowerCase();
  const destination = p.string("destination", { required: true }) as string;
  const sourceTransaction = p.string("source_transaction");
  const metadata = p.metadata();
  checkDestination(ctx, destination);
  checkFunds(ctx, amount, currency, sourceTransaction);
  const id = newId("tr");
  const transfer: Transfer = {
    id,
    object: "transfer",
    amount,
    amount_reversed: 0,
    created: ctx.store.now(),
    currency,
    description: p.string("description", { max: 1000 }) ?? null,
    destination,
    destination_payment: newId("py"),
    livemode: false,
    metadata,
    reversals: { object: "list", data: [], has_more: false, total_count: 0, url: `/v1/transfers/${id}/reversals` },
    reversed: false,
    source_transaction: sourceTransaction ?? null,
    source_type: "card",
    transfer_group: p.string("transfer_group", { max: 5000 }) ?? null,
  };
  ctx.store.state.transfers[id] = transfer;
  ctx.events.emit("transfer.created", transfer, source);
  return expand(ctx.store.state, transfer, paths);
};

const retrieve: ApiHandler = (ctx, { params, path, expand: paths }) => {
  params.allowOnly(["expand"]);
  return expand(ctx.store.state, mustFind(ctx, path.id as string), paths);
};

const reverse: ApiHandler = (ctx, { params: p, path, source, expand: paths }) => {
  p.allowOnly(["amount", "description", "expand", "metadata", "refund_application_fee"]);
  const transfer = mustFind(ctx, path.id as string);
  const remaining = transfer.amount - transfer.amount_reversed;
  if (remaining === 0) throw invalid(`Transfer ${transfer.id} has already been fully reversed.`, "amount", "amount_too_large");
  const amount = p.integer("amount", { min: 1 }) ?? remaining;
  if (amount > remaining) {
    throw invalid(
      `Reversal amount (${formatAmount(amount, transfer.currency)}) is greater than the amount left to reverse on transfer ${transfer.id} (${formatAmount(remaining, transfer.currency)}).`,
      "amount",
      "amount_too_large",
    );
  }
  const reversal: TransferReversal = {
    id: newId("trr"),
    object: "transfer_reversal",
    amount,
    created: ctx.store.now(),
    currency: transfer.currency,
    destination_payment_refund: newId("pyr"),
    metadata: p.metadata(),
    source_refund: null,
    transfer: transfer.id,
  };
  const previous = { amount_reversed: transfer.amount_reversed, reversed: transfer.reversed };
  transfer.amount_reversed += amount;
  transfer.reversed = transfer.amount_reversed === transfer.amount;
  transfer.reversals.data.unshift(reversal);
  transfer.reversals.total_count = transfer.reversals.data.length;
  ctx.events.emit("transfer.reversed", transfer, source, previous);
  return expand(ctx.store.state, reversal, paths);
};

const listReversals: ApiHandler = (ctx, { params, path }) => {
  params.allowOnly(["ending_before", "expand", "limit", "starting_after"]);
  return mustFind(ctx, path.id as string).reversals;
};

const retrieveReversal: ApiHandler = (ctx, { params, path, expand: paths }) => {
  params.allowOnly(["expand"]);
  const reversal = mustFind(ctx, path.id as string).reversals.data.find((r) => r.id === path.reversal);
  if (!reversal) throw noSuch("transfer_reversal", path.reversal as string);
  return expand(ctx.store.state, reversal, paths);
};

export const transferRoutes: ApiRoute[] = [
  { method: "POST", pattern: "/v1/transfers", handler: create },
  { method: "GET", pattern: "/v1/transfers/:id", handler: retrieve },
  { method: "POST", pattern: "/v1/transfers/:id/reversals", handler: reverse },
  { method: "GET", pattern: "/v1/transfers/:id/reversals", handler: listReversals },
  { method: "GET", pattern: "/v1/transfers/:id/reversals/:reversal", handler: retrieveReversal },
];
