export type SignInResult = { ok: true } | { ok: false; message: string };

/** Signs in through next-auth's credentials endpoint (CSRF token, then POST), reading a 429 plainly. */
export async function signInWithPassword(email: string, password: string): Promise<SignInResult> {
  try {
    const { csrfToken } = (await (await fetch("/api/auth/csrf")).json()) as { csrfToken: string };
    const res = await fetch("/api/auth/callback/credentials", {
      method: "POST",
      headers: { "Content-Type": "application/x-www-form-urlencoded", "X-Auth-Return-Redirect": "1" },
      body: new URLSearchParams({ email, password, csrfToken, callbackUrl: "/home", json: "true" }),
    });
    if (res.status === 429) {
      const wait = res.headers.get("Retry-After");
      return { ok: false, message: `Too many sign-in attempts. Wait ${wait ?? "a few"} seconds and try again.` };
    }
    const data = (await res.json().catch(() => ({}))) as { url?: string };
    const error = data.url ? new URL(data.url, window.location.origin).searchParams.get("error") : "unknown";
    if (!res.ok || error) return { ok: false, message: "That e-mail and password do not match an active account." };
    return { ok: true };
  } catch {
    return { ok: false, message: "We could not reach Gradeline. Check your connection and try again." };
  }
}
