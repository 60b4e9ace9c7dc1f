import { Router } from "../http/router";
import { accountRoutes } from "./accounts";
import { checkoutSessionRoutes } from "./checkout-sessions";
import { eventRoutes } from "./events";
import { paymentIntentRoutes } from "./payment-intents";
import { refundRoutes } from "./refunds";
import { transferRoutes } from "./transfers";
import type { ApiHandler } from "./types";

export function apiRouter(): Router<ApiHandler> {
  return new Router<ApiHandler>([
    ...checkoutSessionRoutes,
    ...paymentIntentRoutes,
    ...refundRoutes,
    ...accountRoutes,
    ...transferRoutes,
    ...eventRoutes,
  ]);
}
