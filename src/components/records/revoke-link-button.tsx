"use client";
import { useActionState } from "react";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import type { ActionResult } from "@/shared/action-result";

type RevokeAction = (previous: ActionResult<{ linkId: string }> | null, payload: { jobId: string; linkId: string }) => Promise<ActionResult<{ linkId: string }>>;

/** Ends one customer link at once; the page reloads its list on success. */
export function RevokeLinkButton({ jobId, linkId, action }: { jobId: string; linkId: string; action: RevokeAction }) {
  const router = useRouter();
  const [state, run, pending] = useActionState(async (previous: ActionResult<{ linkId: string }> | null) => {
    const result = await action(previous, { jobId, linkId });
    if (result.ok) router.refresh();
    return result;
  }, null);
  if (state?.ok) return <span className="text-caption text-ink-soft">revoked</span>;
  return (
    <form action={run} className="inline-flex items-center gap-2">
      <Button type="submit" variant="ghost" disabled={pending} data-testid={`revoke-link-${linkId}`}>
        {pending ? "Revoking…" : "Revoke link"}
      </Button>
      {state && !state.ok ? <span role="status" className="text-caption text-stop">{state.message}</span> : null}
    </form>
  );
}
