import { planHone } from "./plan";
import type { BoreStateInput, HonePlan, IncomingSurfaceInput, PlanHoneInput } from "./plan-types";
import type { FinishedBoreInput } from "./sizing";

export interface JobCylinderInput {
  cylinder: number;
  bore: BoreStateInput;
  /** The piston matched to this bore; defaults to the job's piston. */
  piston?: FinishedBoreInput;
  /** What this bore's first stones must clean up; defaults to the job's. */
  incomingSurface?: IncomingSurfaceInput;
}

export type PlanJobInput = Omit<PlanHoneInput, "bore"> & { cylinders: JobCylinderInput[] };

export interface JobPlan {
  cylinders: Array<{ cylinder: number; plan: HonePlan }>;
  /** Stone heights after the whole job, by stone id. */
  stoneHeightsAfterUm: Record<string, number>;
}

/** Plans every cylinder in the given order, carrying each stone's wear into the next bore [D, DESIGN §5.4]. */
export function planHoneJob(input: PlanJobInput): JobPlan {
  const heights = new Map(input.stones.map((s) => [s.id, s.currentHeightUm]));
  const { cylinders, ...shared } = input;
  const results = cylinders.map(({ cylinder, bore, piston, incomingSurface }) => {
    const stones = shared.stones.map((s) => ({ ...s, currentHeightUm: heights.get(s.id) ?? s.currentHeightUm }));
    const plan = planHone({ ...shared, piston: piston ?? shared.piston, bore, stones, ...(incomingSurface && { incomingSurface }) });
    for (const stage of plan.stages) if (stage.kind !== "bore") heights.set(stage.stoneId, stage.stoneWear.heightAfterUm);
    return { cylinder, plan };
  });
  return { cylinders: results, stoneHeightsAfterUm: Object.fromEntries(heights) };
}
