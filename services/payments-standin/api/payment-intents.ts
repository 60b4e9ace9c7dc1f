import { noSuch } from "../core/errors";
import { expand } from "../core/expand";
import type { ApiHandler, ApiRoute } from "./types";

const retrieveIntent: ApiHandler = (ctx, { params, path, expand: paths }) => {
  params.allowOnly(["client_secret", "expand"]);
  const intent = ctx.store.state.payment_intents[path.id as string];
  if (!intent) throw noSuch("payment_intent", path.id as string);
  return expand(ctx.store.state, intent, paths);
};

const retrieveCharge: ApiHandler = (ctx, { params, path, expand: paths }) => {
  params.allowOnly(["expand"]);
  const charge = ctx.store.state.charges[path.id as string];
  if (!charge) throw noSuch("charge", path.id as string);
  return expand(ctx.store.state, charge, paths);
};

export const paymentIntentRoutes: ApiRoute[] = [
  { method: "GET", pattern: "/v1/payment_intents/:id", handler: retrieveIntent },
  { method: "GET", pattern: "/v1/charges/:id", handler: retrieveCharge },
];
