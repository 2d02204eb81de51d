import type { PlanView, StageView } from "@/server/plans/preview-view";
import { fixed, fromDeck, setup, setupUnit, size, small, type DisplayUnits } from "@/shared/units";
import { StageRate, type LearnedFigures } from "@/components/learning/learned-rate";

type StoneRef = { id: string; code: string; gritLabel: string; pressureUnit: string; learned?: LearnedFigures | null };

/** A honing stage, of a saved plan or of the preview alike. */
export const isHoneStage = <S extends { kind: string }>(s: S): s is Exclude<S, { kind: "bore" }> => s.kind !== "bore";

const th = "px-2 py-1 text-left font-semibold text-ink-soft";
// Cells wrap between figures, never inside one (`Fig`), so the tables fit the wizard's column at 1366 px and a tablet.
const td = "num px-2 py-1 align-top";
// The set-up table has seven columns on a tablet's plan page: tighter cells.
const sth = "px-1 py-1 text-left font-semibold text-ink-soft";
const std = "num px-1 py-1 align-top";
const Fig = ({ children }: { children: string }) => <span className="whitespace-nowrap">{children}</span>;

function StageRow({ stage, units, stone }: { stage: StageView; units: DisplayUnits; stone: StoneRef | undefined }) {
  if (stage.kind === "bore") {
    return (
      <tr className="border-t border-rule">
        <td className="px-2 py-1 font-semibold">Bore</td>
        <td className={td}>to <Fig>{size(stage.boreToUm, units)}</Fig></td>
        <td className={td}><Fig>{small(stage.stockUm, units)}</Fig></td>
        <td className={td} colSpan={4}>leaves <Fig>{small(stage.honingAllowanceUm, units)}</Fig> honing allowance</td>
      </tr>
    );
  }
  return (
    <tr className="border-t border-rule" data-testid={`stage-${stage.kind}`}>
      <td className="px-2 py-1 font-semibold capitalize">{stage.kind}</td>
      <td className="px-2 py-1 align-top">
        {stone ? <>{stone.code}<br /><span className="num text-caption text-ink-soft">{stone.gritLabel}</span></> : stage.stoneId}
        <br /><span className="num whitespace-nowrap">{fixed(stage.pressure, 2)} {stone?.pressureUnit ?? ""}</span>
      </td>
      <td className={td}><Fig>{small(stage.stockUm, units)}</Fig>{stage.dwell ? <><br /><span className="text-caption">incl. dwell <Fig>{small(stage.dwell.stockUm, units)}</Fig> at {stage.dwell.end}</span></> : null}</td>
      <td className={td} data-testid={`stage-rate-${stage.kind}`}>
        {"removal" in stage ? <StageRate removalUm={stage.removal.removalPerDoubleStrokeUm} multiplier={stage.removal.learnedMultiplier} learned={stone?.learned} /> : "—"}
      </td>
      <td className={td}>
        <span className="font-semibold">{stage.strokes.nominal}</span> <span className="text-ink-soft">({stage.strokes.low}–{stage.strokes.high})</span>
        {stage.checkpoint ? <><br /><span className="text-caption">check after {stage.checkpoint.afterStrokes}: <Fig>{size(stage.checkpoint.expectedDiameterUm, units)}</Fig></span></> : null}
      </td>
      <td className={td}><Fig>{size(stage.expectedDiameterAfterUm, units)}</Fig></td>
      <td className={td}><Fig>{size(stage.stoneWear.heightAfterUm, units)}</Fig><br /><span className="text-caption text-ink-soft">limit <Fig>{size(stage.stoneWear.wearLimitHeightUm, units)}</Fig></span></td>
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
      <table className="plan-table w-full border-collapse text-body">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr>
            <th className={th}>Stage</th><th className={th}>Stone · pressure</th><th className={th}>Stock</th>
            <th className={th}>Removal / double stroke</th><th className={th}>Double strokes (range) · checkpoint</th><th className={th}>Size after</th><th className={th}>Stone left</th>
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
      <table className="plan-table w-full border-collapse text-body">
        <caption className="sr-only">Stroke set-up and speeds</caption>
        <thead>
          <tr>
            <th className={sth}>Stage</th><th className={sth}>Head stroke · stone length</th><th className={sth}>Overtravel top / bottom</th>
            <th className={sth}>Upper stop¹ / lower stop²</th>
            <th className={sth}>Spindle · double strokes/min</th><th className={sth}>Crosshatch</th><th className={sth}>Cutting speed</th>
          </tr>
        </thead>
        <tbody>
          {hone.map((s, i) => (
            <tr key={i} className="border-t border-rule" data-testid={`setup-${s.kind}`}>
              <td className="px-1 py-1 font-semibold capitalize">{s.kind}<br /><span className="text-caption font-normal">{stones.find((x) => x.id === s.stoneId)?.code}</span></td>
              <td className={std}><Fig>{setup(s.strokeSetup.strokeLengthUm, units)}</Fig><br /><span className="text-caption text-ink-soft"><Fig>{setup(s.strokeSetup.stoneLengthUm, units)}</Fig></span></td>
              <td className={std}><Fig>{setup(s.strokeSetup.overtravelTopUm, units)}</Fig><br /><Fig>{setup(s.strokeSetup.overtravelBottomUm, units)}</Fig></td>
              <td className={std}>{fromDeck(s.strokeSetup.upperReversal.stoneTopFromDeckUm, setupUnit(units))}<br />{fromDeck(s.strokeSetup.lowerReversal.stoneBottomFromDeckUm, setupUnit(units))}</td>
              <td className={std}>{fixed(s.speeds.spindleRpm, 0)} rpm<br />{fixed(s.speeds.doubleStrokesPerMin)} /min</td>
              <td className={std}>{fixed(s.speeds.includedAngleDeg)}°<br /><span className="text-caption text-ink-soft">target {s.speeds.targetAngleDeg}°</span></td>
              <td className={std}>{fixed(s.speeds.cuttingSpeed)}<br /><span className="text-caption text-ink-soft">m/min</span></td>
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
