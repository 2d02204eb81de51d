import type { PlanPreview } from "@/server/plans/preview";
import type { JobPlanDraft } from "@/shared/plans/schema";
import type { FieldErrors } from "../use-plan-preview";
import type { DisplayUnits } from "@/shared/units";

export type Options = Omit<JobPlanDraft, "mode" | "jobId" | "cylinders">;
export type StepProps<D> = {
  draft: D;
  update: (change: (draft: D) => D) => void;
  preview: PlanPreview | null;
  errors: FieldErrors;
  units: DisplayUnits;
  stoneName: (id: string) => string;
};

export type CylinderDraft = NonNullable<JobPlanDraft["cylinders"]>[number];

/** Changes one cylinder of a job draft. */
export function withCylinder(draft: JobPlanDraft, cylinder: number, patch: (c: CylinderDraft) => CylinderDraft): JobPlanDraft {
  return { ...draft, cylinders: (draft.cylinders ?? []).map((c) => (c.cylinder === cylinder ? patch(c) : c)) };
}

export const err = (errors: FieldErrors, key: string) => errors[key];
