"use client";
import { useCallback, useRef, useState } from "react";
import { newClientId } from "@/shared/client-id";
import { useRouter } from "next/navigation";
import { planRequestSchema, type JobPlanDraft } from "@/shared/plans/schema";
import type { WizardContext } from "@/server/plans/wizard";
import { PlanStrip, PlanSummary } from "./plan-summary";
import { SaveBar, UNREACHABLE, type PlanSaveActions, type SaveState } from "./save-bar";
import { refusalText } from "@/shared/action-result";
import { PistonsStep } from "./steps/pistons-step";
import { ReadingsStep } from "./steps/readings-step";
import { ReviewStep } from "./steps/review-step";
import { StonesStep, stoneLookup } from "./steps/stones-step";
import { StrokeStep } from "./steps/stroke-step";
import { displayUnits, type UnitSystem } from "@/shared/units";
import { countByStep, reviewBlockers, stepEntry } from "./review-blockers";
import { usePlanPreview } from "./use-plan-preview";
import { useStoredDraft } from "./use-stored-draft";
import { useStep, WizardShell, type StepDef } from "./wizard-shell";

const STEPS: StepDef[] = [
  { id: "pistons", title: "Pistons and clearance" },
  { id: "readings", title: "Readings and stock" },
  { id: "stones", title: "Stones and strokes" },
  { id: "stroke", title: "Stroke and crosshatch" },
  { id: "review", title: "Review" },
];

export function JobPlanWizard({ context, unitSystem, actions }: { context: WizardContext; unitSystem: UnitSystem; actions: PlanSaveActions }) {
  const router = useRouter();
  const units = displayUnits(unitSystem);
  const jobId = context.job.id;
  const isThisJobsDraft = useCallback((saved: unknown): saved is JobPlanDraft => (saved as JobPlanDraft)?.mode === "job" && (saved as JobPlanDraft).jobId === jobId, [jobId]);
  const { draft, update, clear } = useStoredDraft(`borewise:plan:${jobId}`, context.initialDraft, isThisJobsDraft);
  const { preview, fieldErrors, error, loading, valid } = usePlanPreview(draft);
  const blockers = reviewBlockers({ fieldErrors, preview, valid, loading });
  const { index, step, go } = useStep(STEPS);
  const [pending, setPending] = useState(false);
  // The device names the plan it saves: "Save and release" after a failed release saves no second plan.
  const planId0 = useRef(newClientId());
  const [state, setState] = useState<SaveState>(null);
  const props = { draft, update, preview, errors: fieldErrors, units, stoneName: stoneLookup(preview) };

  async function save(release: boolean) {
    const checked = planRequestSchema.safeParse(draft);
    if (!checked.success) return setState({ ok: false, message: "Some fields need attention: see the steps marked above." });
    setPending(true);
    const refused = (message: string) => { setState({ ok: false, message }); setPending(false); };
    try {
      const saved = await actions.savePlanDraft(null, { input: { ...checked.data, clientId: planId0.current } });
      if (!saved.ok || !saved.data) return refused(saved.ok ? UNREACHABLE : refusalText(saved));
      const { planId } = saved.data;
      if (release) {
        const released = await actions.releasePlan(null, { planId });
        if (!released.ok) return refused(`Saved as a draft, not released: ${refusalText(released)}`);
      }
      clear();
      router.push(`/jobs/${context.job.id}/plans/${planId}`);
    } catch {
      refused(UNREACHABLE);
    }
  }

  return (
    <WizardShell steps={STEPS} index={index} go={go} marks={countByStep(blockers)} strip={<PlanStrip preview={preview} units={units} loading={loading} />}
      summary={<PlanSummary preview={preview} units={units} loading={loading} error={error?.message ?? null} title={`Job #${context.job.number}`} />}
      last={<SaveBar onSave={save} mayRelease={context.mayRelease} canRelease={preview?.canRelease ?? false} pending={pending} state={state} />}>
      {step.id === "pistons" ? <PistonsStep {...props} context={context} /> : null}
      {step.id === "readings" ? <ReadingsStep {...props} timeZone={context.timeZone} /> : null}
      {step.id === "stones" ? <StonesStep {...props} /> : null}
      {step.id === "stroke" ? <StrokeStep {...props} machines={context.machines} bottomClearanceUm={preview?.job?.bottomClearanceUm} /> : null}
      {step.id === "review" ? <ReviewStep {...props} blockers={blockers} loading={loading} go={go} stepOf={(b) => stepEntry(STEPS, b.step)} /> : null}
    </WizardShell>
  );
}
