// autocannon runs against the bench server, and the signed-in cookies they send.
import autocannon from "autocannon";

import { signIn } from "../../tests/utils/http-session";

export type LoadResult = { p50: number; p99: number; rps: number; requests: number; errors: number; non2xx: number; timeouts: number };

export async function signedInCookie(url: string, email: string, password: string): Promise<string> {
  process.env.GRADELINE_URL = url;
  const session = await signIn(email, password);
  if (!session.signedIn) throw new Error(`could not sign in as ${email} (status ${session.res.status})`);
  return session.cookie;
}

export async function load(url: string, opts: { connections: number; seconds: number; cookie?: string }): Promise<LoadResult> {
  const r = await autocannon({
    url,
    connections: opts.connections,
    duration: opts.seconds,
    headers: opts.cookie ? { cookie: opts.cookie } : {},
  });
  return {
    p50: r.latency.p50,
    p99: r.latency.p99,
    rps: r.requests.total / opts.seconds,
    requests: r.requests.total,
    errors: r.errors,
    non2xx: r.non2xx,
    timeouts: r.timeouts,
  };
}

/** Checks a route answers 200 with the expected text before it is measured, so a 404 or a redirect is not benchmarked. */
export async function expectPage(url: string, text: string, cookie?: string): Promise<void> {
  const res = await fetch(url, { headers: cookie ? { cookie } : {}, redirect: "manual" });
  const body = await res.text();
  if (res.status !== 200 || !body.includes(text)) throw new Error(`${url} answered ${res.status} without "${text}"`);
}

export const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
