import { Suspense } from "react";
import { PageTitle } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { QuickPlanWizard } from "@/components/plan/quick-wizard";
import { DEFAULT_CHECKPOINT_FRACTION, DEFAULT_CROSSHATCH_DEG } from "@/lib/honing";
import { pageActor } from "@/server/http/page";
import { viewerUnits } from "@/server/units";
import { can } from "@/shared/auth/policy";
import { listActiveMachines } from "@/server/plans/library";
import type { QuickPlanDraft } from "@/shared/plans/schema";
import { saveQuickPlanAction } from "./actions";
import { createQuoteAction } from "../quotes/actions";

export const metadata = { title: "Quick plan" };

export default async function QuickPlanPage() {
  const actor = await pageActor();
  if (!can(actor, "plans.create")) return <Notice tone="info" title="Planning is for machinists, leads and owners">Released plans are on the floor screens.</Notice>;
  const machines = (await listActiveMachines({ actor })).map((m) => ({ id: m.id, name: m.name }));
  const initialDraft: QuickPlanDraft = {
    mode: "quick", boreMaterial: "grey_iron", boreLengthUm: Number.NaN, pistonDiameterUm: Number.NaN, bore: { kind: "stock", stockUm: Number.NaN },
    machineId: machines[0]?.id ?? "", clearance: { minUm: Number.NaN, maxUm: Number.NaN, targetUm: null, performanceAllowanceUm: 0 },
    stoneIds: {}, pressures: {}, checkpointFraction: DEFAULT_CHECKPOINT_FRACTION, targetCrosshatchDeg: DEFAULT_CROSSHATCH_DEG, boring: { enabled: null, marginUm: null },
  };
  return (
    <>
      <PageTitle>Quick plan<span className="block text-body font-normal text-ink-soft">Numbers before a block is booked in; save it into a new job when it arrives.</span></PageTitle>
      <Suspense>
        <QuickPlanWizard initialDraft={initialDraft} machines={machines} unitSystem={(await viewerUnits(actor)).system} saveQuickPlan={saveQuickPlanAction}
          quoteAction={can(actor, "quotes.edit") ? createQuoteAction : undefined} />
      </Suspense>
    </>
  );
}
