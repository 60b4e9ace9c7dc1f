import type { CheckoutSession } from "../types";
import { AUTOMATIC, type EmitResult, type EventSource } from "../webhooks/events";
import type { StandinContext } from "./context";

/** Reads a session, expiring it first when its `expires_at` has passed. */
export function findSession(ctx: StandinContext, id: string): CheckoutSession | undefined {
  const session = ctx.store.state.checkout_sessions[id];
  if (session) expireIfDue(ctx, session);
  return session;
}

export function expireSession(ctx: StandinContext, session: CheckoutSession, source: EventSource): EmitResult {
  session.status = "expired";
  session.url = null;
  const result = ctx.events.emit("checkout.session.expired", session, source);
  ctx.store.persist();
  return result;
}

export function expireIfDue(ctx: StandinContext, session: CheckoutSession): void {
  if (session.status === "open" && session.expires_at <= ctx.store.now()) expireSession(ctx, session, AUTOMATIC);
}

export function sweepExpiredSessions(ctx: StandinContext): void {
  for (const session of Object.values(ctx.store.state.checkout_sessions)) expireIfDue(ctx, session);
}
