"use client";
import { useRef, useState } from "react";
import { newClientId } from "@/shared/client-id";
import { useRouter } from "next/navigation";
import { LengthInput } from "@/components/length-input";
import { NumberInput } from "@/components/number-input";
import { quickSaveSchema, type QuickPlanDraft } from "@/shared/plans/schema";
import { PlanStrip, PlanSummary } from "./plan-summary";
import { SaveBar, UNREACHABLE, type QuickSaveAction, type SaveState } from "./save-bar";
import { refusalText } from "@/shared/action-result";
import { QuoteQuickPanel, type QuoteAction } from "@/components/billing/quote-quick-panel";
import { QuickInputsStep } from "./steps/quick-inputs-step";
import { ReviewStep } from "./steps/review-step";
import { StonesStep, stoneLookup } from "./steps/stones-step";
import { StrokeStep } from "./steps/stroke-step";
import { displayUnits, type DisplayUnits, type UnitSystem } from "@/shared/units";
import { countByStep, reviewBlockers, stepEntry, type StepId } from "./review-blockers";
import { usePlanPreview } from "./use-plan-preview";

/** The quick plan asks piston, clearance and stock on one step. */
const foldQuick = (step: StepId) => (step === "pistons" || step === "readings" ? "inputs" : step);
import { useStoredDraft } from "./use-stored-draft";
import { useStep, WizardShell, type StepDef } from "./wizard-shell";
import { inputClass } from "@/components/ui/field";

const STEPS: StepDef[] = [
  { id: "inputs", title: "Piston, clearance and stock" },
  { id: "stones", title: "Stones and strokes" },
  { id: "stroke", title: "Stroke and crosshatch" },
  { id: "review", title: "Review and save" },
];

type NewJob = { engineDescription: string; cylinderCount: number; standardBoreUm: number };
type QuickState = { plan: QuickPlanDraft; job: NewJob };

const isQuickState = (saved: unknown): saved is QuickState => (saved as QuickState)?.plan?.mode === "quick" && typeof (saved as QuickState).job === "object";

function NewJobFields({ job, setJob, units }: { job: NewJob; setJob: (j: NewJob) => void; units: DisplayUnits }) {
  return (
    <fieldset className="grid gap-3 sm:grid-cols-3">
      <legend className="mb-2 font-semibold">Save into a new job</legend>
      <div className="flex flex-col gap-1">
        <label htmlFor="quick-engine" className="font-semibold">Engine</label>
        <input id="quick-engine" className={inputClass} value={job.engineDescription} placeholder="inline four, 1.8 L, iron block" onChange={(e) => setJob({ ...job, engineDescription: e.target.value })} data-testid="quick-engine" />
      </div>
      <NumberInput label="Cylinders" value={job.cylinderCount} onChange={(v) => setJob({ ...job, cylinderCount: v ?? Number.NaN })} testId="quick-cylinders" />
      <LengthInput label="Standard bore" unit={units.size} valueUm={job.standardBoreUm} onChange={(v) => setJob({ ...job, standardBoreUm: v ?? Number.NaN })} testId="quick-standard" />
    </fieldset>
  );
}

export function QuickPlanWizard({ initialDraft, machines, unitSystem, saveQuickPlan, quoteAction }: {
  initialDraft: QuickPlanDraft; machines: Array<{ id: string; name: string }>; unitSystem: UnitSystem; saveQuickPlan: QuickSaveAction; quoteAction?: QuoteAction;
}) {
  const router = useRouter();
  const units = displayUnits(unitSystem);
  // NaN (an unfilled length) does not survive JSON; an empty standard bore is stored as null.
  const stored = useStoredDraft<QuickState>("borewise:quick-plan", { plan: initialDraft, job: { engineDescription: "", cylinderCount: 4, standardBoreUm: Number.NaN } }, isQuickState);
  const draft = stored.draft.plan;
  const job = { ...stored.draft.job, standardBoreUm: stored.draft.job.standardBoreUm ?? Number.NaN };
  const setDraft = (f: (d: QuickPlanDraft) => QuickPlanDraft) => stored.update((s) => ({ ...s, plan: f(s.plan) }));
  const setJob = (next: NewJob) => stored.update((s) => ({ ...s, job: next }));
  const { preview, fieldErrors, error, loading, valid } = usePlanPreview(draft);
  const blockers = reviewBlockers({ fieldErrors, preview, valid, loading });
  const { index, step, go } = useStep(STEPS);
  const [pending, setPending] = useState(false);
  // The device names the job and the plan: a retry finishes the same ones instead of booking another job.
  const ids = useRef({ clientId: newClientId(), jobClientId: newClientId() });
  const [state, setState] = useState<SaveState>(null);
  // Red only once the user has tried to go on (Next, Save) or reached the review; a field shows its own on leaving it.
  const [attempted, setAttempted] = useState(false);
  if (step.id === "review" && !attempted) setAttempted(true);
  const props = { draft, update: setDraft, preview, errors: fieldErrors, units, stoneName: stoneLookup(preview) };

  async function save() {
    setAttempted(true);
    const checked = quickSaveSchema.safeParse({ plan: draft, job });
    if (!checked.success) return setState({ ok: false, message: checked.error.issues.map((i) => i.message).slice(0, 3).join(" ") });
    setPending(true);
    const refused = (message: string) => { setState({ ok: false, message }); setPending(false); };
    try {
      const saved = await saveQuickPlan(null, { input: { ...checked.data, ...ids.current } });
      if (!saved.ok || !saved.data) return refused(saved.ok ? UNREACHABLE : refusalText(saved));
      stored.clear();
      router.push(`/jobs/${saved.data.jobId}/plans/${saved.data.planId}`);
    } catch {
      refused(UNREACHABLE);
    }
  }

  return (
    <WizardShell steps={STEPS} index={index} go={go} marks={countByStep(blockers, foldQuick)} revealed={attempted} onNext={() => setAttempted(true)} strip={<PlanStrip preview={preview} units={units} loading={loading} />}
      summary={<PlanSummary preview={preview} units={units} loading={loading} error={error?.message ?? null} title="Quick plan" />}
      last={<SaveBar onSave={save} mayRelease={false} canRelease={false} pending={pending} state={state} saveLabel="Save into a new job" />}>
      {step.id === "inputs" ? <QuickInputsStep {...props} /> : null}
      {step.id === "stones" ? <StonesStep {...props} /> : null}
      {step.id === "stroke" ? <StrokeStep {...props} machines={machines} bottomClearanceUm={draft.bottomClearanceUm} /> : null}
      {step.id === "review" ? <><ReviewStep {...props} blockers={blockers} loading={loading} go={go} stepOf={(b) => stepEntry(STEPS, foldQuick(b.step))} /><NewJobFields job={job} setJob={setJob} units={units} />{quoteAction ? <QuoteQuickPanel action={quoteAction} quick={{ plan: draft, job }} /> : null}</> : null}
    </WizardShell>
  );
}
