import { route } from "@/server/http/route";
import { notFound } from "@/server/errors";
import { pdfResponse } from "@/server/pdf/render";
import { recordPdfForToken } from "@/server/records/links";

type Params = { token: string };

/** The customer's PDF behind their link (no account); an unknown, expired or revoked link is not found. */
export const GET = route<Params>(async (_request, { params }) => {
  const found = await recordPdfForToken(params.token);
  if (!found) throw notFound("That record");
  return pdfResponse(found.bytes, found.filename, "attachment");
});
