import type { Account } from "../types";
import type { EventSource } from "../webhooks/events";
import type { StandinContext } from "./context";

export const ONBOARDING_REQUIREMENTS = [
  "business_profile.url",
  "external_account",
  "individual.dob.day",
  "individual.first_name",
  "individual.last_name",
  "tos_acceptance.date",
  "tos_acceptance.ip",
];

/** What "Finish setup" does: the stand-in asks for no identity details and enables the account. */
export function completeOnboarding(ctx: StandinContext, account: Account, source: EventSource): Promise<void> {
  const previous = {
    capabilities: { ...account.capabilities },
    charges_enabled: account.charges_enabled,
    details_submitted: account.details_submitted,
    payouts_enabled: account.payouts_enabled,
    requirements: structuredClone(account.requirements),
  };
  Object.assign(account, {
    capabilities: { card_payments: "active", transfers: "active" },
    charges_enabled: true,
    details_submitted: true,
    payouts_enabled: true,
    requirements: { currently_due: [], disabled_reason: null, eventually_due: [], past_due: [] },
  });
  const { firstAttempt } = ctx.events.emit("account.updated", account, source, previous);
  ctx.store.persist();
  return firstAttempt;
}
