import type { IncomingMessage, ServerResponse } from "node:http";

import type { StandinContext } from "../core/context";
import { completePayment, recordDecline } from "../core/payments";
import { findSession } from "../core/sessions";
import { decodeForm, readBody, redirect, sendHtml } from "../http/io";
import type { CheckoutSession } from "../types";
import { checkCard } from "./cards";
import { messagePage } from "./html";
import { renderPayPage } from "./pay-page";

const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

function successUrl(session: CheckoutSession): string {
  return session.success_url.replaceAll("{CHECKOUT_SESSION_ID}", session.id);
}

/** Answers for a session that can't take a payment any more; false when it is still open. */
function closedSession(res: ServerResponse, session: CheckoutSession | undefined, method: "GET" | "POST"): boolean {
  if (!session) {
    sendHtml(res, 404, messagePage("Payment not found", "There is no checkout session at this address."));
    return true;
  }
  if (session.status === "expired") {
    const back = session.cancel_url ? { href: session.cancel_url, label: "Back to Gradeline" } : undefined;
    sendHtml(
      res,
      410,
      messagePage(
        "This payment link has expired",
        "The checkout session expired, so it can no longer be paid. Start the purchase again from Gradeline.",
        back,
      ),
    );
    return true;
  }
  if (session.status === "complete") {
    // A second submit (double click, back button) lands where the first one went.
    if (method === "POST") redirect(res, 303, successUrl(session));
    else
      sendHtml(
        res,
        200,
        messagePage("Already paid", "This checkout session has been paid.", { href: successUrl(session), label: "Continue" }),
      );
    return true;
  }
  return false;
}

export function showPayPage(ctx: StandinContext, res: ServerResponse, id: string): void {
  const session = findSession(ctx, id);
  if (closedSession(res, session, "GET") || !session) return;
  sendHtml(res, 200, renderPayPage({ session, items: ctx.store.state.line_items[id] ?? [] }));
}

export async function submitPayPage(ctx: StandinContext, req: IncomingMessage, res: ServerResponse, id: string): Promise<void> {
  const form = decodeForm(await readBody(req));
  const text = (key: string) => (typeof form[key] === "string" ? (form[key] as string) : "");
  const session = findSession(ctx, id);
  if (closedSession(res, session, "POST") || !session) return;
  if (text("action") === "cancel" && session.cancel_url) return redirect(res, 303, session.cancel_url);

  const items = ctx.store.state.line_items[id] ?? [];
  const values = { card_number: text("card_number"), exp: text("exp"), cvc: text("cvc"), email: text("email").trim() };
  const check = checkCard(values, new Date(ctx.store.now() * 1000));
  const emailError = values.email && !EMAIL.test(values.email) ? "Your email address is invalid." : undefined;
  if (!check.ok || emailError) {
    const errors = { ...(check.ok ? {} : check.errors), ...(emailError ? { email: emailError } : {}) };
    return sendHtml(res, 400, renderPayPage({ session, items, values, errors }));
  }
  if (check.decline) {
    recordDecline(ctx, session, check.decline);
    return sendHtml(res, 402, renderPayPage({ session, items, values, formError: check.decline.message }));
  }
  await completePayment(ctx, session, check.card, session.customer_email ?? (values.email || null));
  redirect(res, 303, successUrl(session));
}
