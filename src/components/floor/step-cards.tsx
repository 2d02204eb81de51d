"use client";
import { useState } from "react";
import { formatLength, inspectCylinder, SURFACE_LABELS, SURFACE_PARAMETERS, type CylinderVerdict, type LengthUnit, type Reestimate } from "@/lib/honing";
import { Button } from "@/components/ui/button";
import { newClientId } from "@/shared/client-id";
import { fromDeck } from "@/shared/floor/cards";
import { blockOutcome, correctedLevels } from "@/shared/floor/outcome";
import { inspectionSubmissionSchema, runSubmissionSchema } from "@/shared/floor/schemas";
import { CardView } from "./card-view";
import { cylinderKey, enqueue, readCylinder, useAnswers, useHydrated, useStored, writeCylinder } from "./device-store";
import { emptyReading, parseReading, ReadingEntry, type ReadingDraft } from "./reading-entry";
import { useFloorPerson } from "./floor-person";
import { SendStatus } from "./send-status";
import { SurfaceReportUpload, type AttachedReport } from "./surface-report-upload";
import type { FloorCylinderData } from "@/shared/floor/cylinder-data";

type DeviceState = {
  index: number;
  strokes: Record<string, string>;
  readings: Record<string, ReadingDraft>;
  surface: Record<string, string>;
  /** The profilometer report uploaded for the final check (optional). */
  surfaceReport?: AttachedReport | null;
  /** After a checkpoint reading that calls for more strokes: the rest of the stage. */
  rest: { position: number; reestimate: Reestimate } | null;
  localStrokes: Record<number, number>;
  note: string | null;
  stopped: boolean;
  finalId: string | null;
  provisional: CylinderVerdict | null;
};

const initial = (data: FloorCylinderData): DeviceState => ({
  index: data.startIndex, strokes: {}, readings: {}, surface: {}, rest: null, localStrokes: {}, note: data.stopNote, stopped: data.stopped, finalId: null, provisional: null,
});

const NEXT_BUTTON_ID = "card-next-button";
const firstIssue = (error: { issues: { message: string }[] }) => error.issues[0]?.message ?? "Check the entry.";

export function StepCards({ data, uploadMaxBytes }: { data: FloorCylinderData; uploadMaxBytes: number }) {
  const owner = useFloorPerson();
  const key = cylinderKey(data.planId, data.cylinder, owner.userId);
  // The device's own record of this cylinder is the source of truth once it exists (it may hold entries not yet sent).
  const stored = useStored<DeviceState>(key);
  const state = stored ?? initial(data);
  const [error, setError] = useState<string | null>(null);
  const answers = useAnswers();
  const loaded = useHydrated();

  const update = (change: (s: DeviceState) => DeviceState) => writeCylinder(key, change(readCylinder<DeviceState>(key) ?? initial(data)));

  const card = data.cards[Math.min(state.index, data.cards.length - 1)]!;
  const unit = data.units.size;
  const strokesText = (cardKey: string, preset: number) => state.strokes[cardKey] ?? String(preset);
  const go = (index: number, extra: Partial<DeviceState> = {}) => { setError(null); update((s) => ({ ...s, index: Math.max(0, Math.min(index, data.cards.length - 1)), rest: null, ...extra })); };

  function queueRun(position: number, block: "full" | "dwell", strokesDone: number, reading: ReturnType<typeof parseReading> | null): boolean {
    const body = {
      id: newClientId(), planId: data.planId, cylinder: data.cylinder, stagePosition: position, block, strokesDone,
      readings: reading?.ok ? reading.levels : null, temperatures: reading?.ok ? reading.temperatures : null, notes: "", doneAt: new Date().toISOString(),
    };
    const valid = runSubmissionSchema.safeParse(body);
    if (!valid.success) { setError(firstIssue(valid.error)); return false; }
    enqueue({ id: body.id, url: "/api/floor/runs", body, owner });
    if (block === "full") update((s) => ({ ...s, localStrokes: { ...s.localStrokes, [position]: (s.localStrokes[position] ?? 0) + strokesDone } }));
    return true;
  }

  const parseStrokes = (text: string) => {
    const n = Number(text);
    if (!Number.isInteger(n) || n < 0) { setError("Strokes are a whole number of double strokes."); return null; }
    return n;
  };

  function finishBlock(position: number, block: "full" | "dwell", cardKey: string, preset: number, nextIndex: number) {
    const n = parseStrokes(strokesText(cardKey, preset));
    if (n !== null && queueRun(position, block, n, null)) go(nextIndex);
  }

  function sendCheckpoint() {
    const position = card.position!;
    const runCard = data.cards.find((c) => c.kind === "run" && c.position === position)!;
    const n = parseStrokes(strokesText(runCard.key, runCard.preset ?? 0));
    if (n === null) return;
    const reading = parseReading(state.readings[card.key] ?? emptyReading(), data.levelNames, unit, data.floorSettings.gaugeTemperatureC);
    if (!reading.ok) { setError(reading.error); return; }
    const before = (data.loggedStrokes[position] ?? 0) + (state.localStrokes[position] ?? 0);
    const levels20C = correctedLevels(reading.levels, reading.temperatures, data.boreMaterial);
    let result;
    try {
      result = blockOutcome({ stages: data.stages, position, finalCheck: data.finalCheck, strokesBefore: before }, { kind: "full", strokesDone: n, levels20C });
    } catch (e) {
      setError(e instanceof Error ? e.message : "That reading cannot be used."); return;
    }
    if (!queueRun(position, "full", n, reading)) return;
    const smallest = Math.min(...levels20C.map((l) => Math.min(l.aUm, l.bUm)));
    const typed = Math.min(...reading.levels.map((l) => Math.min(l.aUm, l.bUm)));
    const atTwenty = reading.temperatures ? ` Smallest reading ${formatLength(typed, unit)} as read, ${formatLength(smallest, unit)} at 20 °C.` : "";
    const reason = result.reestimate ? `${result.reestimate.reason}${atTwenty}` : null;
    if (result.outcome === "stopped") update((s) => ({ ...s, stopped: true, note: reason }));
    else if (result.outcome === "done") go(state.index + 1, { note: reason });
    else update((s) => ({ ...s, rest: { position, reestimate: result.reestimate! }, note: reason }));
  }

  function finishRest() {
    const rest = state.rest!;
    if (rest.reestimate.dwell) {
      const d = parseStrokes(strokesText(`rest-dwell-${rest.position}`, rest.reestimate.dwell.strokes));
      if (d === null || !queueRun(rest.position, "dwell", d, null)) return;
    }
    finishBlock(rest.position, "full", `rest-${rest.position}`, rest.reestimate.strokesToRun, state.index + 1);
  }

  function sendFinal() {
    const reading = parseReading(state.readings.final ?? emptyReading(), data.levelNames, unit, data.floorSettings.gaugeTemperatureC);
    if (!reading.ok) { setError(reading.error); return; }
    const surface = Object.fromEntries(SURFACE_PARAMETERS.flatMap((p) => (state.surface[p]?.trim() ? [[p, Number(state.surface[p])]] : [])));
    const body = { id: newClientId(), planId: data.planId, cylinder: data.cylinder, readings: reading.levels, temperatures: reading.temperatures, surface: Object.keys(surface).length ? surface : null, surfaceReportId: state.surfaceReport?.id ?? null, inspectedAt: new Date().toISOString() };
    const valid = inspectionSubmissionSchema.safeParse(body);
    if (!valid.success) { setError(firstIssue(valid.error)); return; }
    const provisional = inspectCylinder({
      levels: correctedLevels(reading.levels, reading.temperatures, data.boreMaterial), band: data.sizing,
      tolerances: { taperUm: data.finalCheck.taperToleranceUm, outOfRoundUm: data.finalCheck.outOfRoundToleranceUm },
      piston: { diameterUm: data.sizing.pistonDiameterUm, clearanceMinUm: data.sizing.clearanceMinUm, clearanceMaxUm: data.sizing.clearanceMaxUm }, temperatures: reading.temperatures,
      maxTemperatureDifferenceK: data.floorSettings.maxTemperatureDifferenceK,
    });
    enqueue({ id: body.id, url: "/api/floor/inspections", body, owner });
    setError(null);
    update((s) => ({ ...s, finalId: body.id, provisional }));
  }

  const serverVerdict = state.finalId ? (answers[state.finalId] as { verdict?: CylinderVerdict } | undefined)?.verdict ?? null : data.verdict;
  const verdict = serverVerdict ?? state.provisional;
  const input = "num min-h-touch w-40 rounded-md border border-rule-strong bg-white px-3 text-right text-gauge";
  const strokesField = (cardKey: string, preset: number, label = "Strokes done") => (
    <label className="flex flex-col gap-1 text-caption text-ink-soft">{label} (double strokes)
      <input inputMode="numeric" className={input} value={strokesText(cardKey, preset)} data-testid={`strokes-${cardKey}`}
        onChange={(e) => { const v = e.target.value; update((s) => ({ ...s, strokes: { ...s.strokes, [cardKey]: v } })); }} />
    </label>
  );

  return (
    <div className="flex flex-col gap-4" data-loaded={loaded ? "yes" : "no"} data-testid="step-cards">
      <div className="no-print flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-title">{data.heading}</h1>
        <SendStatus />
      </div>
      {!data.mayLog ? <p className="rounded-md bg-caution-light px-3 py-2 text-caution">This cylinder is not assigned to you: you can read the cards but not log on them.</p> : null}
      {state.stopped ? (
        <section className="rounded-lg border-2 border-stop bg-stop-light p-5 text-stop" role="alert" data-testid="stopped">
          <h2 className="text-display">Stop: call the machinist</h2>
          <p className="text-lead" data-testid="stop-note">{state.note ?? data.stopNote ?? "This cylinder was stopped at a reading past the target."}</p>
        </section>
      ) : state.rest ? (
        <CardView card={{ key: `rest-${state.rest.position}`, kind: "run", position: state.rest.position, title: "Run the rest of the stage", cautions: ["guards", "eyes", "clothing"], lines: [state.rest.reestimate.reason], figures: [
          ...(state.rest.reestimate.dwell ? [
            { label: "Dwell first", value: `${state.rest.reestimate.dwell.strokes} short strokes at the ${state.rest.reestimate.dwell.end}` },
            { label: "Dwell upper stop", value: fromDeck(state.rest.reestimate.dwell.upperReversal.stoneTopFromDeckUm, data.units.setup) },
            { label: "Dwell lower stop", value: fromDeck(state.rest.reestimate.dwell.lowerReversal.stoneBottomFromDeckUm, data.units.setup) },
          ] : []),
          { label: "New counter preset", value: `${state.rest.reestimate.strokesToRun} double strokes` },
        ] }} step={state.index + 1} of={data.cards.length}>
          {state.rest.reestimate.dwell ? strokesField(`rest-dwell-${state.rest.position}`, state.rest.reestimate.dwell.strokes, "Dwell strokes done") : null}
          {strokesField(`rest-${state.rest.position}`, state.rest.reestimate.strokesToRun)}
          <Controls onBack={() => update((s) => ({ ...s, rest: null }))} primary={{ label: "Stage done", onClick: finishRest, disabled: !data.mayLog || !loaded }} />
        </CardView>
      ) : (
        <CardView card={card} step={state.index + 1} of={data.cards.length}>
          {state.note && card.kind !== "final" ? <p className="rounded-md bg-steel-light px-3 py-2 text-steel-dark" data-testid="card-note">{state.note}</p> : null}
          {card.kind === "dwell" ? strokesField(card.key, card.preset ?? 0) : null}
          {card.kind === "run" ? strokesField(card.key, card.preset ?? 0) : null}
          {card.kind === "measure" || card.kind === "final" ? (
            <ReadingEntry levels={data.levelNames} unit={unit} draft={state.readings[card.key] ?? emptyReading()} testId={`reading-${card.key}`} shopGaugeC={data.floorSettings.gaugeTemperatureC}
              onLastEnter={() => document.getElementById(NEXT_BUTTON_ID)?.focus()} onChange={(d) => update((s) => ({ ...s, readings: { ...s.readings, [card.key]: d } }))} />
          ) : null}
          {card.kind === "final" ? (
            <details className="rounded-md border border-rule px-3 py-2">
              <summary className="min-h-touch cursor-pointer py-2 text-lead">Surface finish from the profilometer (optional)</summary>
              <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
                {SURFACE_PARAMETERS.map((p) => (
                  <label key={p} className="flex flex-col gap-1 text-caption text-ink-soft">{SURFACE_LABELS[p].name} ({SURFACE_LABELS[p].unit})
                    <input inputMode="decimal" className="num min-h-touch rounded-md border border-rule-strong bg-white px-3 text-right text-lead" value={state.surface[p] ?? ""}
                      onChange={(e) => { const v = e.target.value; update((s) => ({ ...s, surface: { ...s.surface, [p]: v } })); }} />
                  </label>
                ))}
              </div>
              <SurfaceReportUpload planId={data.planId} cylinder={data.cylinder} value={state.surfaceReport ?? null} disabled={!data.mayLog} maxBytes={uploadMaxBytes}
                onChange={(v) => update((s) => ({ ...s, surfaceReport: v }))} />
            </details>
          ) : null}
          {card.kind === "final" && verdict ? <VerdictView verdict={verdict} provisional={!serverVerdict} unit={unit} /> : null}
          <Controls
            onBack={state.index > 0 ? () => go(state.index - 1) : undefined}
            primary={loaded ? primaryFor() : { ...primaryFor(), disabled: true }}
          />
        </CardView>
      )}
      {error ? <p className="rounded-md bg-stop-light px-3 py-2 text-stop" role="alert" data-testid="card-error">{error}</p> : null}
    </div>
  );

  function primaryFor(): { label: string; onClick: () => void; disabled?: boolean } {
    const position = card.position;
    switch (card.kind) {
      case "dwell": return { label: "Dwell done", onClick: () => finishBlock(position!, "dwell", card.key, card.preset ?? 0, state.index + 1), disabled: !data.mayLog };
      case "run": {
        const hasCheckpoint = data.cards[state.index + 1]?.kind === "measure" && data.cards[state.index + 1]?.position === position;
        return hasCheckpoint
          ? { label: "At the counter: measure", onClick: () => go(state.index + 1, { note: null }) }
          : { label: "Stage done", onClick: () => finishBlock(position!, "full", card.key, card.preset ?? 0, state.index + 1), disabled: !data.mayLog };
      }
      case "measure": return { label: "Send reading", onClick: sendCheckpoint, disabled: !data.mayLog };
      case "final": return { label: state.finalId ? "Send another final check" : "Send final check", onClick: sendFinal, disabled: !data.mayLog };
      default: return { label: "Done, next card", onClick: () => go(state.index + 1, { note: null }) };
    }
  }
}

function Controls({ onBack, primary }: { onBack?: () => void; primary: { label: string; onClick: () => void; disabled?: boolean } }) {
  return (
    <div className="no-print flex flex-wrap gap-3 pt-2">
      {onBack ? <Button variant="secondary" className="min-w-[8rem] text-lead" onClick={onBack} data-testid="card-back">Back</Button> : null}
      <Button id={NEXT_BUTTON_ID} className="min-w-[12rem] text-lead" onClick={primary.onClick} disabled={primary.disabled} data-testid="card-next">{primary.label}</Button>
    </div>
  );
}

function VerdictView({ verdict, provisional, unit }: { verdict: CylinderVerdict; provisional: boolean; unit: LengthUnit }) {
  const tone = verdict.status === "pass" ? "border-pass bg-pass-light text-pass" : verdict.status === "held" ? "border-caution bg-caution-light text-caution" : "border-stop bg-stop-light text-stop";
  const label = verdict.status === "pass" ? "Passed" : verdict.status === "held" ? "Held: block too warm" : "Failed";
  return (
    <div className={`rounded-md border-2 px-4 py-3 ${tone}`} data-testid="verdict" data-status={verdict.status}>
      <p className="text-display">{label}{provisional ? " (on this tablet; waiting to send)" : ""}</p>
      <p className="text-lead">{verdict.reason}</p>
      <p className="num" data-testid="verdict-at-20">
        At 20 °C: smallest {formatLength(verdict.minUm, unit)}, largest {formatLength(verdict.maxUm, unit)}, taper {verdict.taperUm.toFixed(1)} µm, out-of-round {verdict.outOfRoundUm.toFixed(1)} µm
        {verdict.temperatureDifferenceK !== null ? ` (block ${verdict.temperatureDifferenceK.toFixed(1)} K from the gauge)` : ""}
      </p>
    </div>
  );
}
