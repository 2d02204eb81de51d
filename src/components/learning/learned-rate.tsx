import { fixed, micro } from "@/shared/units";

/** A learned multiplier as the screens show it: the multiplier, its 90 % interval and the runs behind it. */
export type LearnedFigures = { multiplier: number; low: number; high: number; runsUsed: number; runsIgnored: number };

export function LearnedInterval({ learned }: { learned: LearnedFigures }) {
  return (
    <span className="num">
      ×{fixed(learned.multiplier, 2)} <span className="text-ink-soft">(90 %: {fixed(learned.low, 2)}–{fixed(learned.high, 2)})</span>
    </span>
  );
}

export const runsText = (l: Pick<LearnedFigures, "runsUsed" | "runsIgnored">) =>
  `${l.runsUsed} run${l.runsUsed === 1 ? "" : "s"}${l.runsIgnored > 0 ? `, ${l.runsIgnored} ignored` : ""}`;

/** Removal per double stroke of a stage: the table's figure at its conditions and, once there are runs, the learned one. */
export function StageRate({ removalUm, multiplier, learned }: { removalUm: number; multiplier: number; learned: LearnedFigures | null | undefined }) {
  const tableUm = removalUm / multiplier;
  if (!learned) {
    return <><span>{micro(tableUm, 3)}</span><br /><span className="text-caption text-ink-soft">table, no runs yet</span></>;
  }
  return (
    <>
      <span className="text-ink-soft">table {micro(tableUm, 3)}</span><br />
      <span className="font-semibold">learned {micro(tableUm * learned.multiplier, 3)}</span><br />
      <span className="text-caption text-ink-soft" data-testid="stage-learned"><LearnedInterval learned={learned} /> · {runsText(learned)}</span>
    </>
  );
}
