"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { buttonClass } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { inputClass } from "@/components/ui/field";
import { Confirm } from "@/components/ui/confirm";
import { UNREACHABLE, type SaveState } from "./save-bar";
import { refusalText, type ActionResult, type ObjectAction } from "@/shared/action-result";

export type PlanStatusActions = {
  releasePlan: ObjectAction<{ planId: string }>;
  withdrawPlan: ObjectAction<{ planId: string; input: unknown }>;
};

/** Release, withdraw with a reason, and print; each button only where the role and status allow it. */
export function PlanActions({ planId, status, canRelease, mayRelease, mayWithdraw, actions }: {
  planId: string; status: string; canRelease: boolean; mayRelease: boolean; mayWithdraw: boolean; actions: PlanStatusActions;
}) {
  const router = useRouter();
  const [reason, setReason] = useState("");
  const [state, setState] = useState<SaveState>(null);
  const [pending, setPending] = useState(false);
  // Release and Withdraw change what the floor works from, so each asks once more, saying what follows.
  const [asking, setAsking] = useState<"release" | "withdraw" | null>(null);
  async function run(act: () => Promise<ActionResult<unknown>>, done: string) {
    setPending(true);
    setAsking(null);
    try {
      const result = await act();
      setState(result.ok ? { ok: true, message: done } : { ok: false, message: refusalText(result) });
      if (result.ok) router.refresh();
    } catch {
      setState({ ok: false, message: UNREACHABLE });
    } finally {
      setPending(false);
    }
  }
  return (
    <div className="no-print flex flex-col gap-3">
      <div className="flex flex-wrap gap-3">
        <button type="button" className={buttonClass("secondary")} onClick={() => window.print()} data-testid="print-plan">Print</button>
        {mayRelease && status === "draft" ? (
          <button type="button" className={buttonClass("primary")} disabled={pending || !canRelease} onClick={() => setAsking("release")} data-testid="release-plan">
            Release to the floor
          </button>
        ) : null}
      </div>
      {mayWithdraw && (status === "draft" || status === "released") ? (
        <form className="flex flex-wrap items-end gap-3" onSubmit={(e) => { e.preventDefault(); setAsking("withdraw"); }}>
          <div className="flex min-w-64 flex-1 flex-col gap-1">
            <label htmlFor="withdraw-reason" className="font-semibold">Reason to withdraw</label>
            <input id="withdraw-reason" className={inputClass} value={reason} onChange={(e) => setReason(e.target.value)} data-testid="withdraw-reason" />
          </div>
          <button type="submit" className={buttonClass("danger")} disabled={pending} data-testid="withdraw-plan">Withdraw</button>
        </form>
      ) : null}
      {asking === "release" ? (
        <Confirm
          question="Release this plan to the floor?"
          consequence="The people assigned to its cylinders see its step cards at the machine and can start. To change it afterwards, withdraw it with a reason and release another."
          yes="Yes, release" onYes={() => run(() => actions.releasePlan(null, { planId }), "Released to the floor.")} onNo={() => setAsking(null)} testId="confirm-release"
        />
      ) : null}
      {asking === "withdraw" ? (
        <Confirm
          question="Withdraw this plan?"
          consequence={status === "released" ? "Its step cards leave the floor at once; runs already logged stay on the job. The job can then get another plan." : "The draft can no longer be released. The job can get another plan."}
          yes="Yes, withdraw" danger onYes={() => run(() => actions.withdrawPlan(null, { planId, input: { reason } }), "Withdrawn.")} onNo={() => setAsking(null)} testId="confirm-withdraw"
        />
      ) : null}
      <FormMessage state={state} />
    </div>
  );
}
