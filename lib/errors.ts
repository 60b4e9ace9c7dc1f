export type ErrorCode =
  | "bad_request"
  | "unauthorized"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "unprocessable"
  | "rate_limited"
  | "unavailable"
  | "internal";

const statusByCode: Record<ErrorCode, number> = {
  bad_request: 400,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  unprocessable: 422,
  rate_limited: 429,
  unavailable: 503,
  internal: 500,
};

export type FieldErrors = Record<string, string[]>;

export class AppError extends Error {
  constructor(
    public readonly code: ErrorCode,
    message: string,
    public readonly fieldErrors?: FieldErrors,
    public readonly headers?: Record<string, string>,
  ) {
    super(message);
    this.name = "AppError";
  }

  get status(): number {
    return statusByCode[this.code];
  }
}

export const notFound = (what = "That page") => new AppError("not_found", `${what} was not found.`);

/** `segments[2].to` style paths, the shape every field error uses. */
export function formatPath(path: readonly PropertyKey[]): string {
  return path.reduce<string>((out, key) => (typeof key === "number" ? `${out}[${key}]` : out ? `${out}.${String(key)}` : String(key)), "");
}

export function zodFieldErrors(issues: readonly { path: readonly PropertyKey[]; message: string }[]): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of issues) {
    const key = formatPath(issue.path) || "_form";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}
