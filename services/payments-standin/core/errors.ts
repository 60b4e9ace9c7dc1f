export type ApiErrorType = "api_error" | "card_error" | "idempotency_error" | "invalid_request_error";

/** An error the API answers with `{ error: { type, code, message, param } }`. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly type: ApiErrorType,
    message: string,
    readonly code?: string,
    readonly param?: string,
  ) {
    super(message);
  }

  /**
   * Handlers validate everything before they change state, so a 4xx here means nothing ran; the live
   * API does not save such a refusal under the idempotency key, only outcomes (declines, 5xx).
   */
  get refusedBeforeRunning(): boolean {
    return this.status < 500 && this.status !== 402;
  }

  toBody(): { error: Record<string, string> } {
    const error: Record<string, string> = { type: this.type, message: this.message };
    if (this.code) error.code = this.code;
    if (this.param) error.param = this.param;
    return { error };
  }
}

export function invalid(message: string, param?: string, code?: string): ApiError {
  return new ApiError(400, "invalid_request_error", message, code, param);
}

export function missingParam(param: string): ApiError {
  return invalid(`Missing required param: ${param}.`, param, "parameter_missing");
}

export function noSuch(kind: string, id: string, param = "id"): ApiError {
  return new ApiError(404, "invalid_request_error", `No such ${kind}: '${id}'`, "resource_missing", param);
}
