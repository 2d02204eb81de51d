import type { ReactNode } from "react";

const TONES = {
  stop: "border-stop bg-stop-light text-stop",
  caution: "border-caution bg-caution-light text-caution",
  info: "border-steel bg-steel-light text-steel-dark",
  pass: "border-pass bg-pass-light text-pass",
} as const;

/** A message that must stay visible (an out-of-tolerance value, a safety caution): never a toast. */
export function Notice({ tone = "info", title, children }: { tone?: keyof typeof TONES; title?: ReactNode; children: ReactNode }) {
  return (
    <div role={tone === "stop" ? "alert" : "note"} className={`rounded-md border-l-4 px-4 py-3 ${TONES[tone]}`}>
      {title ? <p className="font-semibold">{title}</p> : null}
      <div className="text-ink">{children}</div>
    </div>
  );
}
