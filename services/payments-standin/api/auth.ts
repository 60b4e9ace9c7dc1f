import type { IncomingMessage } from "node:http";

import { ApiError } from "../core/errors";
import { header } from "../http/io";

function unauthorized(message: string): ApiError {
  return new ApiError(401, "invalid_request_error", message);
}

/** Returns the secret key from `Authorization: Bearer sk_test_...` (or Basic, as curl -u sends it). */
export function authenticate(req: IncomingMessage): string {
  const value = header(req, "authorization");
  if (!value) {
    throw unauthorized("You did not provide an API key. Send it in the Authorization header as 'Bearer sk_test_...'.");
  }
  const [scheme = "", credential = ""] = value.trim().split(/\s+/, 2);
  let key = "";
  if (scheme.toLowerCase() === "bearer") key = credential;
  else if (scheme.toLowerCase() === "basic") key = Buffer.from(credential, "base64").toString("utf8").split(":")[0] ?? "";
  if (!key) throw unauthorized("Invalid Authorization header: use 'Bearer sk_test_...'.");
  if (!key.startsWith("sk_test_") || key.length <= "sk_test_".length) {
    const shown = key.length > 12 ? `${key.slice(0, 8)}****${key.slice(-4)}` : "****";
    throw unauthorized(`Invalid API Key provided: ${shown}. The local payment stand-in accepts test secret keys (sk_test_...) only.`);
  }
  return key;
}
