import type { PlanView, StageView } from "@/server/plans/preview-view";
import { fixed, fromDeck, setup, setupUnit, size, small, type DisplayUnits } from "@/shared/units";
import { StageRate, type LearnedFigures } from "@/components/learning/learned-rate";

type StoneRef = { id: string; code: string; gritLabel: string; pressureUnit: string; learned?: LearnedFigures | null };

/** A honing stage, of a saved plan or of the preview alike. */
export const isHoneStage = <S extends { kind: string }>(s: S): s is Exclude<S, { kind: "bore" }> => s.kind !== "bore";

const th = "px-2 py-1 text-left font-semibold text-ink-soft";
const td = "num whitespace-nowrap px-2 py-1 align-top";

function StageRow({ stage, units, stone }: { stage: StageView; units: DisplayUnits; stone: StoneRef | undefined }) {
  if (stage.kind === "bore") {
    return (
      <tr className="border-t border-rule">
        <td className="px-2 py-1 font-semibold">Bore</td>
        <td className={td} colSpan={2}>to {size(stage.boreToUm, units)}</td>
        <td className={td}>{small(stage.stockUm, units)}</td>
        <td className={td} colSpan={6}>leaves {small(stage.honingAllowanceUm, units)} honing allowance</td>
      </tr>
    );
  }
  return (
    <tr className="border-t border-rule" data-testid={`stage-${stage.kind}`}>
      <td className="px-2 py-1 font-semibold capitalize">{stage.kind}</td>
      <td className="whitespace-nowrap px-2 py-1">{stone ? <>{stone.code}<br /><span className="num text-caption text-ink-soft">{stone.gritLabel}</span></> : stage.stoneId}</td>
      <td className={td}>{fixed(stage.pressure, 2)} {stone?.pressureUnit ?? ""}</td>
      <td className={td}>{small(stage.stockUm, units)}{stage.dwell ? <><br /><span className="text-caption">incl. dwell {small(stage.dwell.stockUm, units)} at {stage.dwell.end}</span></> : null}</td>
      <td className={td} data-testid={`stage-rate-${stage.kind}`}>
        {"removal" in stage ? <StageRate removalUm={stage.removal.removalPerDoubleStrokeUm} multiplier={stage.removal.learnedMultiplier} learned={stone?.learned} /> : "—"}
      </td>
      <td className={td}>
        <span className="font-semibold">{stage.strokes.nominal}</span> <span className="text-ink-soft">({stage.strokes.low}–{stage.strokes.high})</span>
      </td>
      <td className={td}>{stage.checkpoint ? <>after {stage.checkpoint.afterStrokes}: {size(stage.checkpoint.expectedDiameterUm, units)}</> : "—"}</td>
      <td className={td}>{size(stage.expectedDiameterAfterUm, units)}</td>
      <td className={td}>{size(stage.stoneWear.heightAfterUm, units)}<br /><span className="text-caption text-ink-soft">limit {size(stage.stoneWear.wearLimitHeightUm, units)}</span></td>
    </tr>
  );
}

const scrollRegion = "overflow-x-auto rounded focus-visible:outline focus-visible:outline-2 focus-visible:outline-offset-2";

/** The stage sequence of one cylinder: stone, pressure, stock, strokes with range, checkpoint, size after, wear. */
export function StagesTable({ plan, units, stones, caption }: { plan: PlanView; units: DisplayUnits; stones: StoneRef[]; caption: string }) {
  if (plan.stages.length === 0) return <p className="text-stop">No stages: resolve the errors above first.</p>;
  return (
    // Wider than a tablet: the scroll region takes the keyboard focus so it can be scrolled without a mouse (WCAG 2.1.1).
    <div className={scrollRegion} tabIndex={0} role="region" aria-label={caption}>
      <table className="plan-table w-full min-w-[820px] border-collapse text-body">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr>
            <th className={th}>Stage</th><th className={th}>Stone</th><th className={th}>Pressure</th><th className={th}>Stock</th>
            <th className={th}>Removal / double stroke</th><th className={th}>Double strokes (range)</th><th className={th}>Checkpoint: expect</th><th className={th}>Size after</th><th className={th}>Stone left</th>
          </tr>
        </thead>
        <tbody>
          {plan.stages.map((stage, i) => (
            <StageRow key={i} stage={stage} units={units} stone={stage.kind === "bore" ? undefined : stones.find((s) => s.id === stage.stoneId)} />
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** Stroke set-up and speeds per honing stage: what the operator sets on the machine. */
export function SetupTable({ plan, units, stones }: { plan: PlanView; units: DisplayUnits; stones: StoneRef[] }) {
  const hone = plan.stages.filter(isHoneStage);
  if (hone.length === 0) return null;
  return (
    <div className={scrollRegion} tabIndex={0} role="region" aria-label="Stroke set-up and speeds">
      <table className="plan-table w-full min-w-[600px] border-collapse text-body">
        <caption className="sr-only">Stroke set-up and speeds</caption>
        <thead>
          <tr>
            <th className={th}>Stage</th><th className={th}>Stone length</th><th className={th}>Overtravel top / bottom</th><th className={th}>Head stroke</th>
            <th className={th}>Upper stop¹</th><th className={th}>Lower stop²</th>
            <th className={th}>Spindle · double strokes/min</th><th className={th}>Crosshatch</th><th className={th}>Cutting speed</th>
          </tr>
        </thead>
        <tbody>
          {hone.map((s, i) => (
            <tr key={i} className="border-t border-rule" data-testid={`setup-${s.kind}`}>
              <td className="px-2 py-1 font-semibold capitalize">{s.kind}<br /><span className="text-caption font-normal">{stones.find((x) => x.id === s.stoneId)?.code}</span></td>
              <td className={td}>{setup(s.strokeSetup.stoneLengthUm, units)}</td>
              <td className={td}>{setup(s.strokeSetup.overtravelTopUm, units)}<br />{setup(s.strokeSetup.overtravelBottomUm, units)}</td>
              <td className={td}>{setup(s.strokeSetup.strokeLengthUm, units)}</td>
              <td className={td}>{fromDeck(s.strokeSetup.upperReversal.stoneTopFromDeckUm, setupUnit(units))}</td>
              <td className={td}>{fromDeck(s.strokeSetup.lowerReversal.stoneBottomFromDeckUm, setupUnit(units))}</td>
              <td className={td}>{fixed(s.speeds.spindleRpm, 0)} rpm<br />{fixed(s.speeds.doubleStrokesPerMin)} /min</td>
              <td className={td}>{fixed(s.speeds.includedAngleDeg)}°<br /><span className="text-caption text-ink-soft">target {s.speeds.targetAngleDeg}°</span></td>
              <td className={td}>{fixed(s.speeds.cuttingSpeed)}<br /><span className="text-caption text-ink-soft">m/min</span></td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-1 text-caption text-ink-soft">
        ¹ Stone top from the deck at the upper reversal. ² Stone bottom from the deck at the lower reversal. {hone[0]?.speeds.drive === "crank" ? "Crank drive: the angle given is at mid-stroke, where the axial speed peaks." : "Constant-speed drive: the angle is the same along the stroke."}
      </p>
    </div>
  );
}
