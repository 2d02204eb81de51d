import { actorRoute } from "@/server/http/route";
import { pdfResponse } from "@/server/pdf/render";
import { renderRecordPdf } from "@/server/records/pdf";
import { readLogo } from "@/server/records/logo";
import { getRecordView } from "@/server/records/queries";
import { UNIT_SYSTEMS, type UnitSystem } from "@/shared/units";

type Params = { jobId: string };

/** The record as it would be sent now (a preview: no version number). */
export const GET = actorRoute<Params>(async (request, { params, actor }) => {
  const units = new URL(request.url).searchParams.get("units");
  const unitSystem: UnitSystem = UNIT_SYSTEMS.includes(units as UnitSystem) ? (units as UnitSystem) : "metric";
  const record = await getRecordView({ actor, jobId: params.jobId, unitSystem });
  return pdfResponse(await renderRecordPdf(record, null, await readLogo(actor.shopId)), `machining-record-job-${record.job.number}-preview.pdf`);
});
