// The browser side of Gradeline's JSON API: one request helper with the server's error shape.

export type ApiError = { code: string; message: string; fieldErrors?: Record<string, string[]> };
export type ApiResult<T> = { ok: true; data: T } | { ok: false; status: number; error: ApiError };

const FALLBACK: ApiError = { code: "internal", message: "Something went wrong. Please try again." };
const OFFLINE: ApiError = { code: "network", message: "Gradeline could not be reached. Check your connection and try again." };

/** JSON to and from the API; never throws: network trouble answers status 0 with a plain message. */
export async function sendJson<T>(url: string, method: "GET" | "POST" | "PUT" | "PATCH" | "DELETE", body?: unknown): Promise<ApiResult<T>> {
  try {
    const res = await fetch(url, {
      method,
      headers: { accept: "application/json", ...(body === undefined ? {} : { "content-type": "application/json" }) },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const data: unknown = await res.json().catch(() => null);
    if (res.ok) return { ok: true, data: data as T };
    return { ok: false, status: res.status, error: (data as { error?: ApiError } | null)?.error ?? FALLBACK };
  } catch {
    return { ok: false, status: 0, error: OFFLINE };
  }
}

export const postJson = <T>(url: string, body?: unknown) => sendJson<T>(url, "POST", body);

/** For swr: throws the server's message (or `notFound` on a 404) so the page can show it. */
export async function getJson<T>(url: string, notFound?: string): Promise<T> {
  const res = await sendJson<T>(url, "GET");
  if (!res.ok) throw new Error(res.status === 404 && notFound ? notFound : res.error.message);
  return res.data;
}
