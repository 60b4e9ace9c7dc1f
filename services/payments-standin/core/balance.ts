import type { StandinState } from "./state";

/** Platform funds not yet sent on: paid charges less refunds, less transfers not reversed. */
export function availableBalance(state: StandinState, currency: string): number {
  let total = 0;
  for (const charge of Object.values(state.charges)) {
    if (charge.currency === currency) total += charge.amount - charge.amount_refunded;
  }
  for (const transfer of Object.values(state.transfers)) {
    if (transfer.currency === currency) total -= transfer.amount - transfer.amount_reversed;
  }
  return total;
}

/** What is left of a charge for transfers that name it as their source_transaction. */
export function sourceRemaining(state: StandinState, chargeId: string): number {
  const charge = state.charges[chargeId];
  if (!charge) return 0;
  let left = charge.amount;
  for (const transfer of Object.values(state.transfers)) {
    if (transfer.source_transaction === chargeId) left -= transfer.amount - transfer.amount_reversed;
  }
  return left;
}
