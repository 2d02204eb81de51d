"use client";
import { buttonClass } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import type { ObjectAction } from "@/shared/action-result";

export type SaveState = { ok: boolean; message?: string } | null;

/** Save draft, and Save and release for a lead or owner (the server checks the role again). */
export function SaveBar({ onSave, mayRelease, canRelease, pending, state, saveLabel = "Save draft" }: {
  onSave: (release: boolean) => void; mayRelease: boolean; canRelease: boolean; pending: boolean; state: SaveState; saveLabel?: string;
}) {
  return (
    <div className="flex flex-wrap items-center gap-3">
      <button type="button" className={buttonClass("primary")} disabled={pending} onClick={() => onSave(false)} data-testid="save-draft">
        {pending ? "Saving…" : saveLabel}
      </button>
      {mayRelease ? (
        <button type="button" className={buttonClass("secondary")} disabled={pending || !canRelease} onClick={() => onSave(true)} data-testid="save-release"
          title={canRelease ? undefined : "Resolve the errors first"}>
          Save and release
        </button>
      ) : (
        <span className="text-caption text-ink-soft">A lead or the owner releases the plan to the floor.</span>
      )}
      <FormMessage state={state} />
    </div>
  );
}

/** The saves the wizards call: server actions from src/app/(shop)/plan/actions.ts, handed in by the page. */
export type PlanSaveActions = {
  savePlanDraft: ObjectAction<{ input: unknown }, { planId: string; jobId: string }>;
  releasePlan: ObjectAction<{ planId: string }>;
};
export type QuickSaveAction = ObjectAction<{ input: unknown }, { planId: string; jobId: string }>;

/** A network failure reaching a server action, said plainly (the action itself never ran or its answer was lost). */
export const UNREACHABLE = "The server could not be reached. Nothing was lost: try again.";
