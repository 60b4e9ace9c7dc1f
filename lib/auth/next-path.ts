/**
 * Where to go after signing in, from a `next` query value: only a path on this site ("/reports/…"),
 * never another origin ("//evil.test", "/\\evil.test", "https:…"), so the link cannot send anyone away.
 */
export function safeNextPath(value: unknown): string | null {
  if (typeof value !== "string" || value.length > 200) return null;
  if (!/^\/[A-Za-z0-9\-._~/?=&%]*$/.test(value) || value.startsWith("//")) return null;
  return value;
}

/** "/sign-in?email=…&next=…" style links, leaving out what is empty. */
export function authLink(page: "/sign-in" | "/sign-up", params: { email?: string; role?: string; next?: string | null }): string {
  const q = new URLSearchParams();
  for (const [k, v] of Object.entries(params)) if (v) q.set(k, v);
  const s = q.toString();
  return s ? `${page}?${s}` : page;
}
