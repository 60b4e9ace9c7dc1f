import { ApiError } from "../core/errors";
import type { Params } from "../core/params";
import type { Store } from "../core/store";
import type { IdempotencyRecord } from "../types";

function stable(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(stable).join(",")}]`;
  if (value && typeof value === "object") {
    const entries = Object.entries(value as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${stable(v)}`).join(",")}}`;
  }
  return JSON.stringify(value);
}

function idempotencyError(message: string): ApiError {
  return new ApiError(400, "idempotency_error", message);
}

/** Keys are scoped to the API key, like the live API's are to the account. */
export class IdempotencyCache {
  constructor(private readonly store: Store) {}

  /** The saved response for a retry, or undefined for a key seen the first time. */
  replay(apiKey: string, key: string, method: string, path: string, params: Params): IdempotencyRecord | undefined {
    if (key.length > 255) throw idempotencyError("Idempotency keys can be at most 255 characters long.");
    const record = this.store.state.idempotency[`${apiKey}:${key}`];
    if (!record) return undefined;
    if (record.method !== method || record.path !== path) {
      throw idempotencyError(
        `Keys for idempotent requests can only be used for the same endpoint they were first used for ('${record.method} ${record.path}' vs '${method} ${path}'). Try using a key other than '${key}' if you meant to execute a different request.`,
      );
    }
    if (record.params_fingerprint !== stable(params)) {
      throw idempotencyError(
        `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${key}' if you meant to execute a different request.`,
      );
    }
    return record;
  }

  remember(apiKey: string, key: string, method: string, path: string, params: Params, status: number, body: unknown): void {
    this.store.state.idempotency[`${apiKey}:${key}`] = {
      method,
      path,
      params_fingerprint: stable(params),
      status,
      body,
      created: this.store.now(),
    };
  }
}
