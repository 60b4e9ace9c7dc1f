// GET /api/health - the state of the database, storage, payments and mail connections
import { NextResponse } from "next/server";

import { pingDb } from "@/db/client";
import { pingMail } from "@/lib/mail/transport";
import { pingPayments } from "@/lib/payments/health";
import { pingStorage } from "@/lib/storage/client";

export const dynamic = "force-dynamic";

async function check(fn: () => Promise<unknown>) {
  const started = performance.now();
  try {
    const detail = await Promise.race([fn(), new Promise((_, reject) => setTimeout(() => reject(new Error("timed out after 3 s")), 3_000))]);
    return { ok: true, ms: Math.round(performance.now() - started), ...(detail && typeof detail === "object" ? detail : {}) };
  } catch (error) {
    return { ok: false, ms: Math.round(performance.now() - started), error: error instanceof Error ? error.message : String(error) };
  }
}

export async function GET() {
  const [database, storage, payments, mail] = await Promise.all([check(pingDb), check(pingStorage), check(pingPayments), check(pingMail)]);
  const ok = database.ok && storage.ok && payments.ok && mail.ok;
  return NextResponse.json({ ok, services: { database, storage, payments, mail } }, { status: ok ? 200 : 503, headers: { "Cache-Control": "no-store" } });
}
