import { actorRoute } from "@/server/http/route";
import { pdfResponse } from "@/server/pdf/render";
import { invoiceDocument } from "@/server/billing/documents";
import { billingPdf } from "@/server/billing/pdf";

type Params = { invoiceId: string };

/** The invoice as a PDF, numbered once issued (anyone in the shop who may see billing). */
export const GET = actorRoute<Params>(async (_request, { params, actor }) => {
  const document = await invoiceDocument({ actor, invoiceId: params.invoiceId });
  return pdfResponse(await billingPdf(document.doc), document.filename);
});
