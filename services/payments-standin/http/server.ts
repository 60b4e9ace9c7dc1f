import type { IncomingMessage, ServerResponse } from "node:http";

import { createApiHandler } from "../api/dispatch";
import { apiRouter } from "../api/routes";
import type { StandinContext } from "../core/context";
import { showOnboarding, submitOnboarding } from "../pages/connect-routes";
import { messagePage } from "../pages/html";
import { showPayPage, submitPayPage } from "../pages/pay-routes";
import { BodyTooLargeError, sendHtml, sendJson } from "./io";
import { handleStandinRoute } from "./standin-routes";

export function createRequestListener(ctx: StandinContext) {
  const api = createApiHandler(ctx, apiRouter());

  async function route(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const url = new URL(req.url ?? "/", "http://standin.local");
    const method = req.method ?? "GET";
    const path = url.pathname;
    if (path.startsWith("/v1/")) return api(req, res, url);
    if (path.startsWith("/_standin/")) return handleStandinRoute(ctx, req, res, url);

    const pay = /^\/pay\/([^/]+)$/.exec(path);
    if (pay) {
      const id = decodeURIComponent(pay[1] as string);
      if (method === "GET") return showPayPage(ctx, res, id);
      if (method === "POST") return submitPayPage(ctx, req, res, id);
    }
    const connect = /^\/connect\/([^/]+)$/.exec(path);
    if (connect) {
      const id = decodeURIComponent(connect[1] as string);
      if (method === "GET") return showOnboarding(ctx, res, id, url);
      if (method === "POST") return submitOnboarding(ctx, req, res, id);
    }
    if (method === "GET" && path === "/") {
      return sendHtml(
        res,
        200,
        messagePage("Payment stand-in running", "This server stands in for the payments API during Gradeline development and tests."),
      );
    }
    sendHtml(res, 404, messagePage("Not found", "There is nothing at this address."));
  }

  return (req: IncomingMessage, res: ServerResponse): void => {
    route(req, res).catch((err: unknown) => {
      if (res.headersSent) return res.destroy();
      if (err instanceof BodyTooLargeError) return sendJson(res, 413, { error: { type: "invalid_request_error", message: err.message } });
      console.error("[payments-standin]", err);
      sendJson(res, 500, { error: { type: "api_error", message: "The local payment stand-in hit an internal error." } });
    });
  };
}
