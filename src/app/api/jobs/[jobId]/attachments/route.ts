import { env } from "@/env";
import { actorRoute } from "@/server/http/route";
import { readUploadForm } from "@/server/http/body";
import { AppError } from "@/server/errors";
import { admitUpload } from "@/server/uploads/gate";
import { uploadAttachment } from "@/server/uploads/mutations";

type Params = { jobId: string };

// multipart/form-data: file, cylinderId (optional), clientId (optional, the device's id for this
// upload). Role, job, quota and rate are checked before the body is read.
export const POST = actorRoute<Params>(async (request, { params, actor }) => {
  await admitUpload({ actor, jobId: params.jobId, permission: "attachments.upload" });
  const form = await readUploadForm(request, env.UPLOAD_MAX_BYTES);
  if (!form.file) throw new AppError("bad_request", "Choose a file.", { fieldErrors: { file: ["Choose a file."] } });
  const result = await uploadAttachment({ actor, jobId: params.jobId, cylinderId: form.fields.cylinderId || null, file: form.file, clientId: form.fields.clientId });
  return Response.json(result, { status: 201 });
});
