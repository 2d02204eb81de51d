import { env } from "@/env";
import { actorRoute } from "@/server/http/route";
import { AppError } from "@/server/errors";
import { readUploadForm } from "@/server/uploads/form";
import { uploadAttachment } from "@/server/uploads/mutations";

type Params = { jobId: string };

// multipart/form-data: file, cylinderId (optional). Checked by size, name, extension and magic bytes.
export const POST = actorRoute<Params>(async (request, { params, actor }) => {
  const form = await readUploadForm(request, env.UPLOAD_MAX_BYTES);
  if (!form.file) throw new AppError("bad_request", "Choose a file.", { fieldErrors: { file: ["Choose a file."] } });
  const result = await uploadAttachment({ actor, jobId: params.jobId, cylinderId: form.fields.cylinderId || null, file: form.file });
  return Response.json(result, { status: 201 });
});
