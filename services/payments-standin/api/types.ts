import type { StandinContext } from "../core/context";
import type { ParamReader } from "../core/params";
import type { Route } from "../http/router";
import type { EventSource } from "../webhooks/events";

export interface ApiRequest {
  params: ParamReader;
  path: Record<string, string>;
  /** Ties events this request causes back to it, as the live API's `event.request` does. */
  source: EventSource;
  expand: string[];
}

export type ApiHandler = (ctx: StandinContext, req: ApiRequest) => unknown;

export type ApiRoute = Route<ApiHandler>;
