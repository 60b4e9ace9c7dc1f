import type { IncomingMessage, ServerResponse } from "node:http";

import qs from "qs";

import type { Params } from "../core/params";

const MAX_BODY_BYTES = 1024 * 1024;

export class BodyTooLargeError extends Error {}

export async function readBody(req: IncomingMessage): Promise<string> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    const buf = chunk as Buffer;
    size += buf.length;
    if (size > MAX_BODY_BYTES) throw new BodyTooLargeError("request body is larger than 1 MiB");
    chunks.push(buf);
  }
  return Buffer.concat(chunks).toString("utf8");
}

/** Decodes the API's bracketed form encoding (`line_items[0][quantity]=1`). */
export function decodeForm(text: string): Params {
  return qs.parse(text, { arrayLimit: 100, depth: 10, parameterLimit: 2000 }) as Params;
}

export function header(req: IncomingMessage, name: string): string | undefined {
  const value = req.headers[name.toLowerCase()];
  return Array.isArray(value) ? value[0] : value;
}

export function sendJson(res: ServerResponse, status: number, body: unknown, headers: Record<string, string> = {}): void {
  res.writeHead(status, { ...headers, "Content-Type": "application/json; charset=utf-8", "Cache-Control": "no-store" });
  res.end(JSON.stringify(body, null, 2));
}

const PAGE_HEADERS = {
  "Content-Type": "text/html; charset=utf-8",
  "Cache-Control": "no-store",
  "Content-Security-Policy": "default-src 'none'; style-src 'unsafe-inline'; base-uri 'none'; frame-ancestors 'none'",
  "Referrer-Policy": "no-referrer",
  "X-Content-Type-Options": "nosniff",
};

export function sendHtml(res: ServerResponse, status: number, html: string): void {
  res.writeHead(status, PAGE_HEADERS);
  res.end(html);
}

export function redirect(res: ServerResponse, status: 302 | 303, location: string): void {
  res.writeHead(status, { Location: location, "Cache-Control": "no-store" });
  res.end();
}
