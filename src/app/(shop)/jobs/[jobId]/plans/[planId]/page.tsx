import Link from "next/link";
import { BackLink } from "@/components/ui/back-link";
import { Notice } from "@/components/ui/notice";
import { BoreDrawing } from "@/components/plan/bore-drawing";
import { Cautions } from "@/components/plan/cautions";
import { IssuesList } from "@/components/plan/issues-list";
import { PlanActions } from "@/components/plan/plan-actions";
import { releasePlanAction, withdrawPlanAction } from "@/app/(shop)/plan/actions";
import { SetupTable, StagesTable, isHoneStage } from "@/components/plan/stages-table";
import { size, small, type DisplayUnits } from "@/shared/units";
import { PLAN_STATUS_LABELS } from "@/shared/plans/constants";
import { pageActor } from "@/server/http/page";
import { viewerUnits } from "@/server/units";
import { can } from "@/shared/auth/policy";
import { getPlan, type SavedPlan } from "@/server/plans/queries";
import { jobTitle } from "@/server/http/titles";
import { planTimeFor } from "@/server/billing/plan-time";
import { MachineTime } from "@/components/billing/machine-time";
import { dateTimeText } from "@/shared/time";
import { shopTimeZone } from "@/server/shop-settings/time-zone";

export async function generateMetadata({ params }: { params: Promise<{ jobId: string }> }) {
  return jobTitle((await params).jobId, "Saved plan", "Plan");
}

// One sheet per cylinder when printed, to pin beside the machine.
const PRINT_CSS = `@media print {
  @page { size: A4; margin: 10mm; }
  html, body { font-size: 9pt; }
  main { max-width: none !important; padding: 0 !important; }
  .plan-sheet { break-after: page; border: 0 !important; padding: 0 !important; gap: 6px !important; }
  .plan-sheet:last-child { break-after: auto; }
  .plan-table { min-width: 0 !important; font-size: 8pt; line-height: 1.2; }
  .plan-table td, .plan-table th { padding: 1px 4px !important; }
  .plan-drawing { max-width: 150px !important; }
  .plan-sheet .overflow-x-auto { overflow: visible !important; }
  .plan-sheet [role="note"], .plan-sheet [role="alert"] { padding: 4px 8px !important; }
}`;

function CylinderSheet({ plan, c, units }: { plan: SavedPlan; c: SavedPlan["cylinders"][number]; units: DisplayUnits }) {
  const stone = (id: string) => plan.stones.find((s) => s.id === id)?.code ?? "a stone";
  const first = c.plan.stages.find(isHoneStage);
  return (
    <section className="plan-sheet flex flex-col gap-3 rounded-lg border border-rule bg-paper-raised p-4" data-testid={`plan-sheet-${c.cylinder}`}>
      <header className="flex flex-wrap items-baseline gap-x-4">
        <h2 className="text-title">Cylinder {c.cylinder}</h2>
        <span className="text-ink-soft">Job #{plan.job?.number} · {plan.job?.engineDescription} · {plan.machine.name} · plan {PLAN_STATUS_LABELS[plan.status].toLowerCase()}</span>
        {plan.status === "released" ? <Link href={`/floor/${plan.id}/${c.cylinder}`} className="no-print ml-auto inline-flex min-h-touch items-center text-steel underline" data-testid={`floor-link-${c.cylinder}`}>Step cards on the floor</Link> : null}
      </header>
      <dl className="num grid grid-cols-2 gap-x-6 gap-y-1 sm:grid-cols-4">
        <div><dt className="text-caption text-ink-soft">Finished size</dt><dd className="text-lead font-semibold">{size(c.plan.sizing?.targetUm, units)}</dd></div>
        <div><dt className="text-caption text-ink-soft">Band</dt><dd>{size(c.plan.sizing?.minUm, units)} – {size(c.plan.sizing?.maxUm, units)}</dd></div>
        <div><dt className="text-caption text-ink-soft">Piston</dt><dd>{c.piston?.label} · {size(c.piston?.diameterUm, units)}</dd></div>
        <div><dt className="text-caption text-ink-soft">Stock</dt><dd>{small(c.plan.stock?.totalUm, units)} from {c.bore?.basis === "readings" ? "readings" : `a typed ${c.bore?.basis}`}</dd></div>
      </dl>
      <StagesTable plan={c.plan} units={units} stones={plan.stones} caption={`Stages of cylinder ${c.cylinder}`} />
      <div className="grid gap-4 md:grid-cols-[minmax(0,1fr)_200px] print:grid-cols-[minmax(0,1fr)_160px]">
        <div className="min-w-0"><SetupTable plan={c.plan} units={units} stones={plan.stones} /></div>
        {first ? <BoreDrawing boreDiameterUm={first.expectedDiameterAfterUm} boreLengthUm={first.strokeSetup.boreLengthUm} stoneLengthUm={first.strokeSetup.stoneLengthUm}
          upperReversal={first.strokeSetup.upperReversal} lowerReversal={first.strokeSetup.lowerReversal} includedAngleDeg={first.speeds.includedAngleDeg} bottomClearanceUm={plan.job?.bottomClearanceUm} /> : null}
      </div>
      {c.plan.finalCheck ? <p className="num">Final check at {c.plan.finalCheck.levels.join(", ")} in A and B: size in the band, taper ≤ {small(c.plan.finalCheck.taperToleranceUm, units)}, out-of-round ≤ {small(c.plan.finalCheck.outOfRoundToleranceUm, units)}.</p> : null}
      <IssuesList cylinders={[{ cylinder: c.cylinder, plan: c.plan }]} units={units} stoneName={stone} />
      <Cautions />
    </section>
  );
}

export default async function SavedPlanPage({ params }: { params: Promise<{ jobId: string; planId: string }> }) {
  const { jobId, planId } = await params;
  const actor = await pageActor();
  const plan = await getPlan({ actor, jobId, planId });
  const units = await viewerUnits(actor);
  const zone = await shopTimeZone(actor);
  const time = await planTimeFor({ actor, planId: plan.id, cylinders: plan.cylinders });
  return (
    <div className="flex flex-col gap-4">
      <style>{PRINT_CSS}</style>
      <div className="no-print flex flex-wrap items-center gap-3">
        <h1 className="text-title">Plan for job #{plan.job?.number}</h1>
        <span className="rounded-md bg-steel-light px-2 py-1 font-semibold text-steel-dark" data-testid="plan-status">{PLAN_STATUS_LABELS[plan.status]}</span>
        <span className="ml-auto flex flex-wrap gap-4">
          <BackLink href={`/jobs/${jobId}`}>Back to job #{plan.job?.number}</BackLink>
          {can(actor, "plans.create") ? <Link href={`/jobs/${jobId}/plan`} className="inline-flex min-h-touch items-center text-steel underline">New plan in the wizard</Link> : null}
          {can(actor, "quotes.edit") ? <Link href={`/quotes/new?job=${jobId}`} className="inline-flex min-h-touch items-center text-steel underline" data-testid="quote-job-link">Quote this job</Link> : null}
        </span>
      </div>
      <p className="no-print text-ink-soft">
        Saved by {plan.createdByName ?? "—"} on {dateTimeText(plan.createdAt, zone)}
        {plan.releasedAt ? ` · released by ${plan.releasedByName ?? "—"} on ${dateTimeText(plan.releasedAt, zone)}` : ""}
        {plan.withdrawnAt ? ` · withdrawn by ${plan.withdrawnByName ?? "—"}: ${plan.withdrawnReason}` : ""}
      </p>
      {plan.tableChanges.length > 0 ? (
        <Notice tone="caution" title="The rate table has changed since this plan was saved">
          <span data-testid="table-changed">This plan keeps the numbers it was saved with. Changed since: {plan.tableChanges.map((t) => `${t.stoneCode ?? "a removed stone"} (version ${t.usedVersion} → ${t.currentVersion ?? "removed"})`).join(", ")}. Make a new plan to use the current table.</span>
        </Notice>
      ) : null}
      {!plan.canRelease && plan.status === "draft" ? <Notice tone="stop" title="This plan has errors">It cannot be released until they are resolved in a new plan.</Notice> : null}
      <PlanActions planId={plan.id} status={plan.status} canRelease={plan.canRelease} mayRelease={can(actor, "plans.release")} mayWithdraw={can(actor, "plans.withdraw")}
        actions={{ releasePlan: releasePlanAction, withdrawPlan: withdrawPlanAction }} />
      <MachineTime time={time} />
      {plan.cylinders.map((c) => <CylinderSheet key={c.cylinder} plan={plan} c={c} units={units} />)}
    </div>
  );
}
