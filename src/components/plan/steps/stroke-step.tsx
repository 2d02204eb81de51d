"use client";
import { inputClass } from "@/components/ui/field";
import { RevealedError } from "@/components/ui/reveal-errors";
import { BoreDrawing } from "../bore-drawing";
import { IssuesList } from "../issues-list";
import { NumberInput } from "@/components/number-input";
import { parseWithUnit } from "@/shared/quantity";
import { SetupTable, isHoneStage } from "../stages-table";
import { fixed, fromDeck, setup, setupUnit } from "@/shared/units";
import type { Options, StepProps } from "./types";

/** Step 4: machine, target angle, overtravel and a held spindle speed; the set-up, speeds and a picture. */
export function StrokeStep<D extends Options>({ draft, update, preview, errors, units, stoneName, machines, bottomClearanceUm }: StepProps<D> & { machines: Array<{ id: string; name: string }>; bottomClearanceUm?: number | null }) {
  const first = preview?.cylinders.find((c) => c.plan?.stages.some(isHoneStage));
  const stage = first?.plan?.stages.find(isHoneStage);
  const m = preview?.machine;
  return (
    <>
      <fieldset className="grid gap-3 sm:grid-cols-2 xl:grid-cols-4">
        <legend className="mb-2 font-semibold">Machine and crosshatch</legend>
        <div className="flex flex-col gap-1">
          <label htmlFor="machine" className="font-semibold">Machine</label>
          <select id="machine" className={inputClass} value={draft.machineId ?? ""} onChange={(e) => update((d) => ({ ...d, machineId: e.target.value }))} data-testid="machine">
            {machines.length === 0 ? <option value="">No active machine</option> : null}
            {machines.map((x) => <option key={x.id} value={x.id}>{x.name}</option>)}
          </select>
          <RevealedError errors={errors.machineId} />
        </div>
        <NumberInput label="Target crosshatch" unit="°" parse={(t) => parseWithUnit(t, ["°", "deg", "degrees"], "angle")} value={draft.targetCrosshatchDeg ?? 45} errors={errors.targetCrosshatchDeg} hint="Included angle; 45° is the usual figure." testId="target-angle"
          onChange={(v) => update((d) => ({ ...d, targetCrosshatchDeg: v ?? Number.NaN }))} />
        <NumberInput label="Overtravel" unit="%" parse={(t) => parseWithUnit(t, ["%"], "overtravel")} optional value={draft.overtravelFraction == null ? null : Math.round(draft.overtravelFraction * 100)} errors={errors.overtravelFraction}
          hint="Of the stone length, per end. Empty: a third." testId="overtravel" onChange={(v) => update((d) => ({ ...d, overtravelFraction: v == null ? null : v / 100 }))} />
        <NumberInput label="Hold spindle at" unit="rpm" parse={(t) => parseWithUnit(t, ["rpm", "rev/min", "min⁻¹"], "spindle speed")} optional value={draft.spindleRpm} errors={errors.spindleRpm}
          hint={m ? `Empty: chosen within ${m.spindleRpmMin}–${m.spindleRpmMax} rpm.` : "Empty: chosen for the angle."} testId="spindle-rpm" onChange={(v) => update((d) => ({ ...d, spindleRpm: v }))} />
      </fieldset>
      {m ? <p className="num text-caption text-ink-soft">{m.name}: spindle {m.spindleRpmMin}–{m.spindleRpmMax} rpm, {m.doubleStrokesPerMinMin}–{m.doubleStrokesPerMinMax} double strokes/min, {m.drive === "crank" ? "crank" : "constant-speed"} stroke drive.</p> : null}
      {first?.plan && stage ? (
        <div className="flex flex-col gap-4">
          <div className="min-w-0">
            <h3 className="mb-1 font-semibold">Cylinder {first.cylinder}</h3>
            <SetupTable plan={first.plan} units={units} stones={preview!.stones} />
          </div>
          <div className="grid items-start gap-4 sm:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
            <dl className="num grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-lg border border-rule bg-paper-raised p-3" data-testid="speeds">
              <dt className="text-ink-soft">Spindle</dt><dd className="text-lead font-semibold">{fixed(stage.speeds.spindleRpm, 0)} rpm</dd>
              <dt className="text-ink-soft">Stroke rate</dt><dd className="text-lead font-semibold">{fixed(stage.speeds.doubleStrokesPerMin)} double strokes/min</dd>
              <dt className="text-ink-soft">Crosshatch</dt><dd className="text-lead font-semibold">{fixed(stage.speeds.includedAngleDeg)}° <span className="text-body font-normal text-ink-soft">target {stage.speeds.targetAngleDeg}°</span></dd>
              <dt className="text-ink-soft">Cutting speed</dt><dd>{fixed(stage.speeds.cuttingSpeed)} m/min <span className="text-ink-soft">(peripheral {fixed(stage.speeds.peripheralSpeed)}, axial {fixed(stage.speeds.axialSpeed)})</span></dd>
              <dt className="text-ink-soft">Head stroke</dt><dd>{setup(stage.strokeSetup.strokeLengthUm, units)}</dd>
              <dt className="text-ink-soft">Upper stop</dt><dd>stone top {fromDeck(stage.strokeSetup.upperReversal.stoneTopFromDeckUm, setupUnit(units))}</dd>
              <dt className="text-ink-soft">Lower stop</dt><dd>stone bottom {fromDeck(stage.strokeSetup.lowerReversal.stoneBottomFromDeckUm, setupUnit(units))}</dd>
              <dd className="col-span-2 mt-1 font-sans text-caption text-ink-soft">{stage.speeds.choiceRule}</dd>
            </dl>
            <BoreDrawing boreDiameterUm={stage.expectedDiameterAfterUm} boreLengthUm={stage.strokeSetup.boreLengthUm} stoneLengthUm={stage.strokeSetup.stoneLengthUm}
            upperReversal={stage.strokeSetup.upperReversal} lowerReversal={stage.strokeSetup.lowerReversal} includedAngleDeg={stage.speeds.includedAngleDeg} bottomClearanceUm={bottomClearanceUm} />
          </div>
        </div>
      ) : null}
      {preview?.cylinders.filter((c) => c !== first && c.plan).map((c) => (
        <details key={c.cylinder} className="rounded-md border border-rule p-2">
          <summary className="min-h-touch cursor-pointer py-2 font-semibold">Cylinder {c.cylinder}</summary>
          <SetupTable plan={c.plan!} units={units} stones={preview.stones} />
        </details>
      ))}
      <IssuesList cylinders={preview?.cylinders ?? []} units={units} stoneName={stoneName} step="stroke" />
    </>
  );
}
