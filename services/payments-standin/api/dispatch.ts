import type { IncomingMessage, ServerResponse } from "node:http";

import type { StandinContext } from "../core/context";
import { ApiError } from "../core/errors";
import { newId } from "../core/ids";
import { ParamReader, type Params } from "../core/params";
import { BodyTooLargeError, decodeForm, header, readBody, sendJson } from "../http/io";
import type { Router } from "../http/router";
import { STANDIN_API_VERSION } from "../webhooks/sign";
import { authenticate } from "./auth";
import { IdempotencyCache } from "./idempotency";
import type { ApiHandler } from "./types";

/** Handles one /v1 request: key check, form decoding, idempotent replay, then the resource handler. */
export function createApiHandler(ctx: StandinContext, router: Router<ApiHandler>) {
  const cache = new IdempotencyCache(ctx.store);

  return async (req: IncomingMessage, res: ServerResponse, url: URL): Promise<void> => {
    const method = req.method ?? "GET";
    const requestId = newId("req");
    const headers: Record<string, string> = {
      "Request-Id": requestId,
      "Stripe-Version": header(req, "stripe-version") ?? STANDIN_API_VERSION,
    };
    const key = method === "POST" ? (header(req, "idempotency-key") ?? null) : null;
    if (key) headers["Idempotency-Key"] = key;

    let apiKey = "";
    let params: Params = {};
    let status = 200;
    let body: unknown;
    let remember = false;
    try {
      apiKey = authenticate(req);
      const match = router.match(method, url.pathname);
      if (!match) {
        throw new ApiError(
          404,
          "invalid_request_error",
          `Unrecognized request URL (${method}: ${url.pathname}). The local payment stand-in serves only the endpoints Gradeline uses.`,
        );
      }
      params = decodeForm(method === "POST" ? await readBody(req) : url.search.slice(1));
      if (key) {
        const saved = cache.replay(apiKey, key, method, url.pathname, params);
        if (saved) return sendJson(res, saved.status, saved.body, { ...headers, "Idempotent-Replayed": "true" });
      }
      const reader = new ParamReader(params);
      const expand = reader.stringList("expand");
      remember = true;
      body = match.handler(ctx, { params: reader, path: match.params, source: { requestId, idempotencyKey: key }, expand });
    } catch (err) {
      const apiError = toApiError(err);
      status = apiError.status;
      body = apiError.toBody();
      remember = remember && !apiError.refusedBeforeRunning;
    }
    if (key && remember) cache.remember(apiKey, key, method, url.pathname, params, status, structuredClone(body));
    if (method === "POST") ctx.store.persist();
    sendJson(res, status, body, headers);
  };
}

function toApiError(err: unknown): ApiError {
  if (err instanceof ApiError) return err;
  if (err instanceof BodyTooLargeError) return new ApiError(413, "invalid_request_error", "Request body is larger than 1 MiB.");
  console.error("[payments-standin]", err);
  return new ApiError(500, "api_error", "The local payment stand-in hit an internal error.");
}
