/** The live status line under a form: success or the reason nothing changed. */
export function FormMessage({ state }: { state: { ok: boolean; message?: string } | null }) {
  return (
    <p aria-live="polite" role="status" className={`min-h-6 text-body ${state?.ok ? "text-pass" : "text-stop"}`}>
      {state?.message ?? ""}
    </p>
  );
}
