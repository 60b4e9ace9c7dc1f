// Order bodies and writes for the trials against a running app process.
const HOUR = 3_600_000;
const iso = (ms: number) => new Date(Date.now() + ms).toISOString();

export function orderBody(n: number) {
  return {
    address: { street: `${100 + n} Millrace Lane`, city: "Harrow Falls", state: "OR", postalCode: "97991" },
    propertyType: "single_family",
    occupancy: "vacant",
    accessNotes: "Lockbox on the side gate.",
    cleanoutKnown: false,
    deadline: iso(7 * 24 * HOUR),
    timeZone: "America/Los_Angeles",
    visitWindows: [{ start: iso(24 * HOUR), end: iso(32 * HOUR) }],
    anyTimeInWindows: true,
    buyer: { name: "Rowan Teale", email: `rowan.teale+${n}@example.test` },
  };
}

/** POST /api/orders as the signed-in agent; the new order's id, or the status when refused. */
export async function placeOrder(url: string, cookie: string, n: number): Promise<{ status: number; id?: string }> {
  const res = await fetch(`${url}/api/orders`, {
    method: "POST",
    headers: { cookie, origin: url, "content-type": "application/json" },
    body: JSON.stringify(orderBody(n)),
  });
  const json = (await res.json().catch(() => ({}))) as { id?: string };
  return { status: res.status, id: res.status === 201 ? json.id : undefined };
}

export async function orderExists(url: string, cookie: string, id: string): Promise<boolean> {
  const res = await fetch(`${url}/api/orders/${id}`, { headers: { cookie } });
  return res.status === 200;
}
