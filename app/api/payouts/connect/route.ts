// POST /api/payouts/connect - create (once) the inspector's connected payout account and return its setup link
import { payoutAccountOf, setPayoutAccount } from "@/db/queries/payouts";
import { route } from "@/lib/api/route";
import { appUrl } from "@/lib/env";
import { getStripe } from "@/lib/payments/stripe";

export const POST = route({ permission: "profile:edit" }, async ({ user }) => {
  const stripe = getStripe();
  let accountId = await payoutAccountOf(user.id);
  if (!accountId) {
    const account = await stripe.accounts.create({ type: "express", email: user.email, metadata: { inspectorId: user.id } }, { idempotencyKey: `connect-${user.id}` });
    accountId = account.id;
    await setPayoutAccount(user.id, accountId);
  }
  const link = await stripe.accountLinks.create({ account: accountId, type: "account_onboarding", refresh_url: `${appUrl()}/earnings?connect=retry`, return_url: `${appUrl()}/earnings?connect=done` });
  return { url: link.url };
});
