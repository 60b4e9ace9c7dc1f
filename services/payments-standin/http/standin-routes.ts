import type { IncomingMessage, ServerResponse } from "node:http";

import type { StandinContext } from "../core/context";
import { sweepExpiredSessions } from "../core/sessions";
import { decodeForm, readBody, sendJson } from "./io";

/** Test and development helpers under /_standin; they are not part of the payments API. */
export async function handleStandinRoute(ctx: StandinContext, req: IncomingMessage, res: ServerResponse, url: URL): Promise<void> {
  const method = req.method ?? "GET";
  const path = url.pathname;

  if (method === "GET" && path === "/_standin/health") return sendJson(res, 200, { ok: true });

  if (method === "GET" && path === "/_standin/events") {
    const type = url.searchParams.get("type");
    const data = ctx.store.state.events.filter((r) => !type || r.event.type === type).reverse();
    return sendJson(res, 200, { object: "list", data, has_more: false, url: "/_standin/events" });
  }

  const resend = /^\/_standin\/resend\/([^/]+)$/.exec(path);
  if (method === "POST" && resend) {
    const record = ctx.events.find(decodeURIComponent(resend[1] as string));
    if (!record) return sendJson(res, 404, { error: { type: "invalid_request_error", message: "No such event" } });
    await ctx.events.resend(record);
    return sendJson(res, 200, record);
  }

  if (method === "POST" && path === "/_standin/reset") {
    ctx.store.reset();
    return sendJson(res, 200, { ok: true });
  }

  if (method === "POST" && path === "/_standin/advance-clock") {
    const form = decodeForm(await readBody(req));
    const raw = url.searchParams.get("seconds") ?? (typeof form.seconds === "string" ? form.seconds : "");
    const seconds = Number(raw);
    if (!Number.isInteger(seconds) || seconds < 0) {
      return sendJson(res, 400, {
        error: { type: "invalid_request_error", message: "seconds must be a non-negative integer", param: "seconds" },
      });
    }
    ctx.store.state.clock_offset += seconds;
    sweepExpiredSessions(ctx);
    ctx.store.persist();
    return sendJson(res, 200, { ok: true, now: ctx.store.now(), clock_offset: ctx.store.state.clock_offset });
  }

  sendJson(res, 404, { error: { type: "invalid_request_error", message: `Unknown stand-in helper: ${method} ${path}` } });
}
