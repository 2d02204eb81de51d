"use client";
import { createContext, useContext, type ReactNode } from "react";
import type { ObjectAction } from "@/shared/action-result";

// The job screens' server actions (src/app/(shop)/jobs/actions.ts), handed in by the page once so the
// panels deep in the workspace call them without importing app code.

type Act<I, T = unknown> = ObjectAction<I, T>;
type OnJob<I = object> = { jobId: string } & I;

export type JobActions = {
  createJob: Act<{ input: unknown }, { id: string }>;
  updateJob: Act<OnJob<{ input: unknown }>, { id: string }>;
  setJobStatus: Act<OnJob<{ input: unknown }>>;
  setJobArchived: Act<OnJob<{ archived: boolean }>>;
  assignCylinder: Act<OnJob<{ cylinderId: string; assignedUserId: string | null }>>;
  createPiston: Act<OnJob<{ input: unknown }>>;
  updatePiston: Act<OnJob<{ pistonId: string; input: unknown }>>;
  deletePiston: Act<OnJob<{ pistonId: string }>>;
  createReadingSet: Act<OnJob<{ input: unknown }>>;
  deleteReadingSet: Act<OnJob<{ readingSetId: string }>>;
  deleteAttachment: Act<OnJob<{ attachmentId: string }>>;
};

const JobActionsContext = createContext<JobActions | null>(null);

export function JobActionsProvider({ actions, children }: { actions: JobActions; children: ReactNode }) {
  return <JobActionsContext.Provider value={actions}>{children}</JobActionsContext.Provider>;
}

export function useJobActions(): JobActions {
  const actions = useContext(JobActionsContext);
  if (!actions) throw new Error("The job screens need a JobActionsProvider (the page hands in src/app/(shop)/jobs/actions.ts).");
  return actions;
}
