import type { PlanPreview } from "@/server/plans/preview";
import { ISSUE_STEP } from "./issue-text";
import type { FieldErrors } from "./use-plan-preview";
import { userText } from "@/shared/words/user-text";

/** The wizard steps a problem can sit on; the quick wizard folds pistons and readings into one. */
export type StepId = "pistons" | "readings" | "stones" | "stroke" | "review";
export type Blocker = { step: StepId; text: string };

const FIELD_STEPS: ReadonlyArray<readonly [RegExp, StepId]> = [
  [/^(clearance|pistonDiameterUm)(\.|$)|^cylinders\.\d+\.(pistonId|pistonDiameterUm)/, "pistons"],
  [/^(cylinders|bore|boring|incomingSurface|boreLengthUm|bottomClearanceUm|boreMaterial)(\.|$)/, "readings"],
  [/^(stoneIds|pressures|checkpointFraction)(\.|$)/, "stones"],
  [/^(machineId|targetCrosshatchDeg|overtravelFraction|spindleRpm)(\.|$)/, "stroke"],
];

/** The step a form field belongs to, by its schema path ("pressures.finish" → stones). */
export function stepOfField(path: string): StepId {
  return FIELD_STEPS.find(([pattern]) => pattern.test(path))?.[1] ?? "review";
}

/**
 * Everything that stops the plan being saved or released, each on its step: fields the schema refuses
 * (the same schema the server runs), what a cylinder still needs, and the plan's own errors. The review
 * says "no errors" only when this is empty and the preview answers the draft as it stands.
 */
export function reviewBlockers({ fieldErrors, preview, valid, loading }: { fieldErrors: FieldErrors; preview: PlanPreview | null; valid: boolean; loading: boolean }): Blocker[] {
  const fields = Object.entries(fieldErrors).flatMap(([path, messages]) => messages.map((text) => ({ step: stepOfField(path), text })));
  const form = !valid && fields.length === 0 ? [{ step: "review" as StepId, text: "Some fields need attention." }] : fields;
  if (!preview) return loading || form.length > 0 ? form : [{ step: "review", text: "The plan has not been worked out yet." }];
  // With a field that will not save, the plan on screen is the last one worked out: its errors still stand.
  return [...form, ...preview.cylinders.flatMap((c) => [
    ...c.needs.map((n) => ({ step: (n.field === "piston" ? "pistons" : "readings") as StepId, text: userText(n.message) })),
    ...(c.plan?.errors ?? []).map((e) => ({ step: ISSUE_STEP[e.code] as StepId, text: `Cylinder ${c.cylinder}: ${userText(e.message)}` })),
  ])];
}

/** A blocker's step as a wizard lists it (a step it does not have falls to its review). */
export function stepEntry(steps: ReadonlyArray<{ id: string; title: string }>, step: string): { id: string; title: string; index: number } {
  const found = steps.findIndex((s) => s.id === step);
  const index = found >= 0 ? found : steps.length - 1;
  return { ...steps[index]!, index };
}

/** How many blockers each step holds, for the marks on the step tabs. */
export function countByStep(blockers: readonly Blocker[], fold: (step: StepId) => string = (s) => s): Record<string, number> {
  const out: Record<string, number> = {};
  for (const b of blockers) out[fold(b.step)] = (out[fold(b.step)] ?? 0) + 1;
  return out;
}
