import { actorRoute } from "@/server/http/route";
import { pdfResponse } from "@/server/pdf/render";
import { quoteDocument } from "@/server/billing/documents";
import { billingPdf } from "@/server/billing/pdf";

type Params = { quoteId: string };

/** The quote as a PDF (anyone in the shop who may see billing; another shop's quote is not found). */
export const GET = actorRoute<Params>(async (_request, { params, actor }) => {
  const document = await quoteDocument({ actor, quoteId: params.quoteId });
  return pdfResponse(await billingPdf(document.doc), document.filename);
});
