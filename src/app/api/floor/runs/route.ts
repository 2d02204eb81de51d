import { actorRoute, readJson } from "@/server/http/route";
import { submitRun } from "@/server/runs/submit-run";
import { runSubmissionSchema } from "@/shared/floor/schemas";

// The floor device's queue posts each block of strokes here; a retry with the same id gets the same answer.
export const POST = actorRoute(async (request, { actor }) => Response.json(await submitRun({ actor, input: await readJson(request, runSubmissionSchema) })));
