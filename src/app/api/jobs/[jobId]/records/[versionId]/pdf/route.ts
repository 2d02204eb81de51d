import { actorRoute } from "@/server/http/route";
import { pdfResponse } from "@/server/pdf/render";
import { getVersionPdf } from "@/server/records/queries";

type Params = { jobId: string; versionId: string };

/** One sent version's PDF, exactly as it went out. */
export const GET = actorRoute<Params>(async (_request, { params, actor }) => {
  const { bytes, filename } = await getVersionPdf({ actor, jobId: params.jobId, versionId: params.versionId });
  return pdfResponse(bytes, filename, "attachment");
});
