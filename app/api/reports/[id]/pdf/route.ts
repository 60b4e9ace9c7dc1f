// GET /api/reports/{id}/pdf - the rated summary as a PDF, for those entitled to it
import { pdfFileName } from "@/components/report/report-text";
import { getReportView } from "@/db/queries/reports";
import { route } from "@/lib/api/route";
import { notFound } from "@/lib/errors";
import { renderReportPdf } from "@/lib/pdf/report-pdf";
import { idParams } from "@/lib/validations/orders";

export const GET = route({ permission: "reports:read", params: idParams }, async ({ user, params }) => {
  const view = await getReportView(params.id, user);
  if (!view || view.locked) throw notFound("That report");
  const pdf = await renderReportPdf(view);
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="${pdfFileName(view.address.street)}"`,
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
});
