"use client";
import { buttonClass } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

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

/** POSTs JSON and returns the payload, or throws with the server's message. */
export async function postJson<T>(url: string, body: unknown): Promise<T> {
  const response = await fetch(url, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
  const payload = await response.json().catch(() => ({}));
  if (!response.ok) {
    const fields = payload.fieldErrors ? Object.values(payload.fieldErrors as Record<string, string[]>).flat().slice(0, 3).join(" ") : "";
    throw new Error([payload.message ?? "That did not work.", fields].filter(Boolean).join(" "));
  }
  return payload as T;
}
