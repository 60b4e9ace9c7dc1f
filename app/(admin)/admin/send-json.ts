export type ApiError = { code: string; message: string; fieldErrors?: Record<string, string[]> };
export type ApiResult<T> = { ok: true; data: T } | { ok: false; status: number; error: ApiError };

/** JSON to and from the admin API, with the server's error shape (or a plain one for network trouble). */
export async function sendJson<T>(url: string, method: "GET" | "POST" | "PATCH", body?: unknown): Promise<ApiResult<T>> {
  try {
    const res = await fetch(url, {
      method,
      headers: { accept: "application/json", ...(body === undefined ? {} : { "content-type": "application/json" }) },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const data: unknown = await res.json().catch(() => null);
    if (res.ok) return { ok: true, data: data as T };
    return {
      ok: false,
      status: res.status,
      error: (data as { error?: ApiError } | null)?.error ?? { code: "internal", message: "Something went wrong. Please try again." },
    };
  } catch {
    return {
      ok: false,
      status: 0,
      error: { code: "network", message: "Gradeline could not be reached. Check your connection and try again." },
    };
  }
}

/** For swr: throws the server's message so the page can show it. */
export async function getJson<T>(url: string): Promise<T> {
  const res = await sendJson<T>(url, "GET");
  if (!res.ok) throw new Error(res.error.message);
  return res.data;
}
