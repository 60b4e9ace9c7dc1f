// POST /api/reports/{id}/share - a read-only link that expires; GET - the buyer's links
import { z } from "zod";

import { getReportView } from "@/db/queries/reports";
import { createShareLink, listShareLinks } from "@/db/queries/share-links";
import { json, route } from "@/lib/api/route";
import { notFound } from "@/lib/errors";
import { idParams } from "@/lib/validations/orders";

const body = z.object({ label: z.string().trim().max(80).optional(), days: z.number().int().min(1).max(90).default(14) });

async function requireUnlocked(orderId: string, user: Parameters<typeof getReportView>[1]) {
  const view = await getReportView(orderId, user);
  if (!view || view.locked) throw notFound("That report");
}

export const GET = route({ permission: "reports:pay", params: idParams }, async ({ user, params }) => {
  await requireUnlocked(params.id, user);
  return { links: await listShareLinks(params.id, user.id) };
});

export const POST = route({ permission: "reports:pay", params: idParams, body }, async ({ user, params, body }) => {
  await requireUnlocked(params.id, user);
  return json(await createShareLink(params.id, user.id, body), 201);
});
