// GET /s/{token}/pdf - the PDF of a shared rated summary; the token is the only key
import { z } from "zod";

import { pdfFileName } from "@/components/report/report-text";
import { getSharedReport } from "@/db/queries/reports";
import { route } from "@/lib/api/route";
import { notFound } from "@/lib/errors";
import { renderReportPdf } from "@/lib/pdf/report-pdf";

export const dynamic = "force-dynamic";

const tokenParams = z.object({ token: z.string().regex(/^[A-Za-z0-9_-]{20,100}$/, "Not a valid link.") });

export const GET = route({ permission: "public", params: tokenParams }, async ({ params }) => {
  const shared = await getSharedReport(params.token);
  if (!shared) throw notFound("That shared report");
  const pdf = await renderReportPdf(shared);
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="${pdfFileName(shared.address.street)}"`,
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
      "x-robots-tag": "noindex",
      "referrer-policy": "no-referrer",
    },
  });
});
