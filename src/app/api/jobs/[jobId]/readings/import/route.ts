import { actorRoute } from "@/server/http/route";
import { AppError } from "@/server/errors";
import { importReadingsCsv } from "@/server/readings/import";
import { GAUGE_CSV_MAX_BYTES } from "@/shared/uploads/file-rules";
import { readUploadForm } from "@/server/http/body";
import { admitUpload } from "@/server/uploads/gate";

type Params = { jobId: string };

// multipart/form-data: file (the CSV), kind, gauge, mode=preview|commit. Route handler, not a server
// action: the action body limit is 1 MB and uploads belong here (web-anchors A4).
export const POST = actorRoute<Params>(async (request, { params, actor }) => {
  await admitUpload({ actor, jobId: params.jobId, permission: "readings.edit" });
  const form = await readUploadForm(request, GAUGE_CSV_MAX_BYTES);
  if (!form.file) throw new AppError("bad_request", "Choose a CSV file.", { fieldErrors: { file: ["Choose a CSV file."] } });
  const options = { kind: form.fields.kind, gauge: form.fields.gauge, mode: form.fields.mode, clientId: form.fields.clientId };
  const result = await importReadingsCsv({ actor, jobId: params.jobId, file: form.file, options });
  return Response.json(result, { status: result.ok ? (result.written ? 201 : 200) : 422 });
});
