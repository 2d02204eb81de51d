import type { DisplayUnits } from "@/shared/units";
import { METRIC, heightLeft } from "@/shared/units";

type Wear = { fractionLeft: number; state: "ok" | "near" | "worn" };
const TONE = { ok: "bg-pass", near: "bg-caution", worn: "bg-stop" } as const;
const WORD = { ok: "", near: "near wear limit", worn: "at or below wear limit" } as const;

/** Current stone height against its wear limit: the bar is the usable height (start − limit) left. */
export function WearBar({ currentHeightUm, wearLimitHeightUm, wear, compact = false, units = METRIC }: { currentHeightUm: number; wearLimitHeightUm: number; wear: Wear; compact?: boolean; units?: DisplayUnits }) {
  const percent = Math.round(wear.fractionLeft * 100);
  return (
    <div className="flex min-w-40 flex-col gap-1" data-testid="wear-bar" data-wear={wear.state}>
      <div
        role="meter"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        aria-label={`Usable stone height left: ${percent} %`}
        className="h-3 w-full overflow-hidden rounded-full border border-rule-strong bg-paper-sunk"
      >
        <div className={`h-full ${TONE[wear.state]}`} style={{ width: `${Math.max(percent, wear.state === "worn" ? 0 : 2)}%` }} />
      </div>
      <p className={`text-caption ${wear.state === "ok" ? "text-ink-soft" : wear.state === "near" ? "text-caution" : "text-stop"}`}>
        <span className="num">{heightLeft(currentHeightUm, wearLimitHeightUm, units)}</span>
        {compact ? null : <span> · {percent} % usable left</span>}
        {WORD[wear.state] ? <strong className="font-semibold"> · {WORD[wear.state]}</strong> : null}
      </p>
    </div>
  );
}
