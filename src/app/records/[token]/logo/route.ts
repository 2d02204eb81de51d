import { notFound } from "@/server/errors";
import { route } from "@/server/http/route";
import { shopOfRecordToken } from "@/server/records/links";
import { logoResponse } from "@/server/records/logo";

type Params = { token: string };

/** The shop's logo on the customer's record page (no account); a dead link shows nothing. */
export const GET = route<Params>(async (_request, { params }) => {
  const shopId = await shopOfRecordToken(params.token);
  if (!shopId) throw notFound("That record");
  return logoResponse(shopId);
});
