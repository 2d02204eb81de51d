import { env } from "@/env";
import { actorRoute } from "@/server/http/route";
import { readUploadForm } from "@/server/http/body";
import { AppError } from "@/server/errors";
import { admitSurfaceReport, uploadSurfaceReport } from "@/server/runs/surface-report";
import { surfaceReportTargetSchema } from "@/shared/floor/schemas";

// multipart/form-data: file, clientId (the device's id for this upload); ?planId=…&cylinder=… in the
// address, so role, assignment, quota and rate are checked before the body is read.
export const POST = actorRoute(async (request, { actor }) => {
  const url = new URL(request.url);
  const target = surfaceReportTargetSchema.safeParse({ planId: url.searchParams.get("planId"), cylinder: url.searchParams.get("cylinder") });
  if (!target.success) throw new AppError("bad_request", target.error.issues[0]?.message ?? "Name the plan and cylinder.");
  const loaded = await admitSurfaceReport({ actor, ...target.data });
  const form = await readUploadForm(request, env.UPLOAD_MAX_BYTES);
  if (!form.file) throw new AppError("bad_request", "Choose a file.", { fieldErrors: { file: ["Choose a file."] } });
  const result = await uploadSurfaceReport({ actor, loaded, file: form.file, clientId: form.fields.clientId });
  return Response.json(result, { status: 201 });
});
