import type { IncomingMessage, ServerResponse } from "node:http";

import { completeOnboarding } from "../core/accounts";
import type { StandinContext } from "../core/context";
import { decodeForm, readBody, redirect, sendHtml } from "../http/io";
import type { Account, AccountLinkRecord } from "../types";
import { AUTOMATIC } from "../webhooks/events";
import { esc, messagePage, page } from "./html";

type LinkCheck = { link: AccountLinkRecord; account: Account } | undefined;

/** A link is good once, for a few minutes; a stale one sends the browser to refresh_url, as the live flow does. */
function checkLink(ctx: StandinContext, res: ServerResponse, accountId: string, linkId: string): LinkCheck {
  const state = ctx.store.state;
  const link = state.account_links[linkId];
  const account = state.accounts[accountId];
  if (!link || !account || link.account !== accountId) {
    sendHtml(res, 404, messagePage("Link not valid", "This onboarding link is not valid. Start again from Gradeline."));
    return undefined;
  }
  if (link.used || link.expires_at <= ctx.store.now()) {
    if (link.refresh_url) redirect(res, 303, link.refresh_url);
    else
      sendHtml(res, 410, messagePage("Link expired", "This onboarding link has expired or was already used. Start again from Gradeline."));
    return undefined;
  }
  return { link, account };
}

function renderOnboarding(account: Account, link: AccountLinkRecord): string {
  const done = account.details_submitted;
  return page(
    "Set up payouts",
    `<div class="panel">
<h1>Set up payouts</h1>
<p>Connected account <strong>${esc(account.id)}</strong>${account.email ? ` for <strong>${esc(account.email)}</strong>` : ""}.</p>
<p class="muted">${done ? "Setup is already finished for this account." : "This stand-in asks for no identity or bank details. Finishing setup marks the account as verified, with charges and payouts enabled."}</p>
<form method="post" action="/connect/${esc(account.id)}">
<input type="hidden" name="link" value="${esc(link.id)}">
<div class="actions">
<button class="primary" type="submit" name="action" value="finish">Finish setup</button>
<button class="secondary" type="submit" name="action" value="leave">Not now</button>
</div>
</form>
</div>`,
  );
}

export function showOnboarding(ctx: StandinContext, res: ServerResponse, accountId: string, url: URL): void {
  const found = checkLink(ctx, res, accountId, url.searchParams.get("link") ?? "");
  if (found) sendHtml(res, 200, renderOnboarding(found.account, found.link));
}

export async function submitOnboarding(ctx: StandinContext, req: IncomingMessage, res: ServerResponse, accountId: string): Promise<void> {
  const form = decodeForm(await readBody(req));
  const found = checkLink(ctx, res, accountId, typeof form.link === "string" ? form.link : "");
  if (!found) return;
  const { link, account } = found;
  link.used = true;
  // Reaching return_url says nothing about the outcome: the app must read the account, as with the live flow.
  if (form.action === "finish" && !account.details_submitted) await completeOnboarding(ctx, account, AUTOMATIC);
  else ctx.store.persist();
  if (link.return_url) redirect(res, 303, link.return_url);
  else sendHtml(res, 200, messagePage("You can close this page", "Return to Gradeline to continue."));
}
