import { actorRoute, readJson } from "@/server/http/route";
import { submitInspection } from "@/server/runs/inspect";
import { inspectionSubmissionSchema } from "@/shared/floor/schemas";

// The floor device's queue posts each final check here; a retry with the same id gets the same answer.
export const POST = actorRoute(async (request, { actor }) => Response.json(await submitInspection({ actor, input: await readJson(request, inspectionSubmissionSchema) })));
