"use server";
import { z } from "zod";
import { defineAction } from "@/server/http/action";
import { assignCylinder, createJob, setJobArchived, setJobStatus, updateJob } from "@/server/jobs/mutations";
import { createPiston, deletePiston, updatePiston } from "@/server/pistons/mutations";
import { createReadingSet, deleteReadingSet } from "@/server/readings/mutations";
import { deleteAttachment } from "@/server/uploads/mutations";
import { id } from "@/shared/fields";

// The job screens' mutations (one mutation path: DEVELOPERS.md). Each form calls its action with the
// object it validated with the shared schema; the server function parses it again and asserts the
// exact permission (the wrapper's is the floor every caller must clear: apprentices enter readings).

const onJob = z.object({ jobId: id });
const withInput = onJob.extend({ input: z.unknown() });

export const createJobAction = defineAction(z.object({ input: z.unknown() }), "jobs.create", async (actor, { input }) => createJob({ actor, input }));
export const updateJobAction = defineAction(withInput, "jobs.edit", async (actor, { jobId, input }) => updateJob({ actor, jobId, input }));
export const setJobStatusAction = defineAction(withInput, "jobs.setStatus", async (actor, { jobId, input }) => setJobStatus({ actor, jobId, input }));
export const setJobArchivedAction = defineAction(onJob.extend({ archived: z.boolean() }), "jobs.edit", async (actor, { jobId, archived }) => setJobArchived({ actor, jobId, archived }));
export const assignCylinderAction = defineAction(onJob.extend({ cylinderId: id, assignedUserId: z.string().max(36).nullable() }), "jobs.edit", async (actor, { jobId, cylinderId, assignedUserId }) =>
  assignCylinder({ actor, jobId, cylinderId, userId: assignedUserId || null }),
);

export const createPistonAction = defineAction(withInput, "pistons.edit", async (actor, { jobId, input }) => createPiston({ actor, jobId, input }));
export const updatePistonAction = defineAction(withInput.extend({ pistonId: id }), "pistons.edit", async (actor, { jobId, pistonId, input }) => updatePiston({ actor, jobId, pistonId, input }));
export const deletePistonAction = defineAction(onJob.extend({ pistonId: id }), "pistons.edit", async (actor, { jobId, pistonId }) => deletePiston({ actor, jobId, pistonId }));

export const createReadingSetAction = defineAction(withInput, "jobs.view", async (actor, { jobId, input }) => createReadingSet({ actor, jobId, input }));
export const deleteReadingSetAction = defineAction(onJob.extend({ readingSetId: id }), "readings.edit", async (actor, { jobId, readingSetId }) => deleteReadingSet({ actor, jobId, readingSetId }));

export const deleteAttachmentAction = defineAction(onJob.extend({ attachmentId: id }), "attachments.upload", async (actor, { jobId, attachmentId }) => deleteAttachment({ actor, jobId, attachmentId }));
