import type { JobActions } from "@/components/jobs/job-actions";
import * as a from "./actions";

/** The job screens' actions as the pages hand them to JobActionsProvider. */
export const jobActions: JobActions = {
  createJob: a.createJobAction, updateJob: a.updateJobAction, setJobStatus: a.setJobStatusAction, setJobArchived: a.setJobArchivedAction,
  assignCylinder: a.assignCylinderAction, createPiston: a.createPistonAction, updatePiston: a.updatePistonAction, deletePiston: a.deletePistonAction,
  createReadingSet: a.createReadingSetAction, deleteReadingSet: a.deleteReadingSetAction, deleteAttachment: a.deleteAttachmentAction,
};
