import { actorRoute } from "@/server/http/route";
import { deleteAttachment } from "@/server/uploads/mutations";

type Params = { jobId: string; attachmentId: string };

export const DELETE = actorRoute<Params>(async (_request, { params, actor }) =>
  Response.json(await deleteAttachment({ actor, jobId: params.jobId, attachmentId: params.attachmentId })),
);
