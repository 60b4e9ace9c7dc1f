// GET /api/payouts/export - the inspector's earnings as CSV
import { listEarnings } from "@/db/queries/payouts";
import { route } from "@/lib/api/route";

const cell = (v: string | number | null) => {
  const s = v === null ? "" : String(v);
  // Quote everything and defuse spreadsheet formulas.
  return `"${(/^[=+\-@]/.test(s) ? `'${s}` : s).replace(/"/g, '""')}"`;
};
const dollars = (cents: number) => (cents / 100).toFixed(2);

export const GET = route({ permission: "profile:edit" }, async ({ user }) => {
  const rows = await listEarnings(user.id);
  const lines = [
    ["Paid on", "Address", "Price (USD)", "Platform fee (USD)", "Payout (USD)", "Reversed (USD)", "Status", "Sent on"].map(cell).join(","),
    ...rows.map((r) => [r.paidAt?.slice(0, 10) ?? "", `${r.street}, ${r.city}`, dollars(r.priceCents), dollars(r.feeCents), dollars(r.payoutCents), dollars(r.reversedCents), r.status, r.sentAt?.slice(0, 10) ?? ""].map(cell).join(",")),
  ];
  return new Response(`${lines.join("\r\n")}\r\n`, {
    headers: { "Content-Type": "text/csv; charset=utf-8", "Content-Disposition": 'attachment; filename="gradeline-earnings.csv"', "Cache-Control": "no-store" },
  });
});
