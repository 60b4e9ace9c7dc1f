/** Signs in through next-auth's credentials endpoint from a script: CSRF token, then POST. */
export const base = () => process.env.GRADELINE_URL!;

function cookiesFrom(res: Response, jar: Map<string, string>) {
  for (const c of res.headers.getSetCookie()) {
    const [pair] = c.split(";");
    const i = pair.indexOf("=");
    jar.set(pair.slice(0, i), pair.slice(i + 1));
  }
}

export const cookieHeader = (jar: Map<string, string>) => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");

export async function signIn(email: string, password: string, url = base()) {
  const jar = new Map<string, string>();
  const csrfRes = await fetch(`${url}/api/auth/csrf`);
  cookiesFrom(csrfRes, jar);
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const res = await fetch(`${url}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: cookieHeader(jar) },
    body: new URLSearchParams({ email, password, csrfToken, json: "true" }),
  });
  cookiesFrom(res, jar);
  const signedIn = [...jar.keys()].some((k) => k.endsWith("next-auth.session-token"));
  return { res, jar, signedIn, cookie: cookieHeader(jar), csrfToken };
}

export async function signOut(jar: Map<string, string>, csrfToken: string, url = base()) {
  return fetch(`${url}/api/auth/signout`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: cookieHeader(jar) },
    body: new URLSearchParams({ csrfToken, json: "true" }),
  });
}
