import { assertCan } from "@/server/auth/guard";
import { AppError } from "@/server/errors";
import { readUploadForm } from "@/server/http/body";
import { actorRoute } from "@/server/http/route";
import { logoResponse, setLogo } from "@/server/records/logo";
import { LOGO_MAX_BYTES } from "@/shared/records/logo";

// The shop's logo: GET for any member (the record page's header), POST multipart `file` for the owner,
// whose role is checked before a byte of the body is read. Removal is a server action.
export const GET = actorRoute(async (_request, { actor }) => {
  assertCan(actor, "jobs.view");
  return logoResponse(actor.shopId);
});

export const POST = actorRoute(async (request, { actor }) => {
  assertCan(actor, "shop.edit");
  const form = await readUploadForm(request, LOGO_MAX_BYTES);
  if (!form.file) throw new AppError("bad_request", "Choose a picture.", { fieldErrors: { file: ["Choose a picture."] } });
  return Response.json(await setLogo({ actor, file: form.file }), { status: 201 });
});
