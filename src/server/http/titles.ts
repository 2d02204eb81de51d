import "server-only";
import { cache } from "react";
import { getViewer } from "@/server/auth/current";
import { loadJob } from "@/server/jobs/access";

// Page titles that name what is open ("Job #12 · inline four…"), so a tab, a bookmark and a screen
// reader say which job it is. A title never fails the page: anything unreadable falls back.

const MAX_ENGINE_CHARS = 40;

/** "Job #12 · <engine>" for the signed-in viewer's job, or null when it cannot be read. */
export const jobLabel = cache(async (jobId: string): Promise<string | null> => {
  try {
    const actor = (await getViewer())?.actor;
    if (!actor) return null;
    const job = await loadJob({ actor, jobId });
    const engine = job.engineDescription.length > MAX_ENGINE_CHARS ? `${job.engineDescription.slice(0, MAX_ENGINE_CHARS - 1)}…` : job.engineDescription;
    return `Job #${job.number} · ${engine}`;
  } catch {
    return null;
  }
});

/** Metadata whose title is `what` of the job ("Plan · Job #12 · …"), or `fallback` without one. */
export async function jobTitle(jobId: string, what: string | null, fallback: string) {
  const label = await jobLabel(jobId);
  return { title: label ? [what, label].filter(Boolean).join(" · ") : fallback };
}
