// The step cards of one cylinder, generated from the saved plan: one action per card (issue 12 §2).
// Pure, so the interactive cards, the printable sheet and the tests read the same list.
import { formatLength, type FinalCheck, type HoneStage, type LengthUnit, type PlanStage } from "@/lib/honing";
import { isHone } from "./outcome";
import { fromDeck } from "@/shared/units";

export type CardUnits = { size: LengthUnit; small: LengthUnit; setup: LengthUnit };
export const cardUnits = (system: "metric" | "inch"): CardUnits => (system === "inch" ? { size: "in", small: "thou", setup: "in" } : { size: "mm", small: "um", setup: "mm" });

export type CautionKey = "spindle" | "guards" | "oil" | "eyes" | "clothing" | "stops";
export const CARD_CAUTIONS: Record<CautionKey, string> = {
  spindle: "Stop the spindle before gauging the bore, inserting or withdrawing the hone, or changing stones.",
  guards: "Keep the guards and splash shields in place while the spindle turns.",
  oil: "Neat honing oil and its mist can catch fire: run the mist extraction, keep ignition sources away, wipe up spills.",
  eyes: "Wear eye protection.",
  clothing: "No loose sleeves, gloves or jewellery near the turning spindle.",
  stops: "The lower stop keeps the stones off the crank webs or the blind end: check it before the first stroke.",
};
export const CAUTION_DEFERRAL = "Reminders only: the machine maker's manual and local rules govern safe work.";

export type CardKind = "mount" | "stops" | "guards" | "stone" | "settings" | "dwell" | "run" | "measure" | "final";
export type CardFigure = { label: string; value: string };

export interface StepCard {
  key: string;
  kind: CardKind;
  title: string;
  /** Plan position of the stage the card belongs to; null for set-up and the final check. */
  position: number | null;
  figures: CardFigure[];
  lines: string[];
  cautions: CautionKey[];
  /** Counter preset of a run or dwell card. */
  preset?: number;
}

export interface CardInput {
  stages: readonly PlanStage[];
  finalCheck: FinalCheck;
  torquePlate: boolean;
  stones: readonly { id: string; code: string; currentHeightUm: number; wearLimitHeightUm: number }[];
  pressureUnit: string;
  units: CardUnits;
}

/** Sizes and stocks at the unit's own precision; set-up lengths (stops, stroke, stone height) at 0.1 mm or 0.001 in. */
const len = (um: number, unit: LengthUnit) => formatLength(um, unit);
const setupLen = (um: number, unit: LengthUnit) => formatLength(um, unit, unit === "mm" ? { decimals: 1 } : unit === "in" ? { decimals: 3 } : undefined);

export { fromDeck };

function stageCards(stage: HoneStage, position: number, n: number, input: CardInput): StepCard[] {
  const { units } = input;
  const stone = input.stones.find((s) => s.id === stage.stoneId);
  const name = `Stage ${n}: ${stage.kind}`;
  const heightOk = stone ? stone.currentHeightUm - stage.stoneWear.wearUm >= stone.wearLimitHeightUm : true;
  const cards: StepCard[] = [
    {
      key: `stone-${position}`, kind: "stone", position, title: `${name} — fit the stone set`, cautions: ["spindle"],
      figures: [
        { label: "Stone set", value: stone?.code ?? "—" },
        { label: "Height now", value: stone ? setupLen(stone.currentHeightUm, units.setup) : "—" },
        { label: "Wear limit", value: stone ? setupLen(stone.wearLimitHeightUm, units.setup) : "—" },
        { label: "After this stage", value: stone ? setupLen(stone.currentHeightUm - stage.stoneWear.wearUm, units.setup) : "—" },
      ],
      lines: [heightOk ? "Check the stone height against the wear limit before fitting." : "This stage would take the stones below their wear limit: fit a fresh set and tell the machinist."],
    },
    {
      key: `settings-${position}`, kind: "settings", position, title: `${name} — pressure and speeds`, cautions: ["guards"],
      figures: [
        { label: "Pressure", value: `${stage.pressure} ${input.pressureUnit}` },
        { label: "Spindle", value: `${stage.speeds.spindleRpm.toFixed(0)} rpm` },
        { label: "Stroke rate", value: `${stage.speeds.doubleStrokesPerMin.toFixed(0)} double strokes/min` },
        { label: "Crosshatch", value: `${stage.speeds.includedAngleDeg.toFixed(0)}°` },
      ],
      lines: ["Set the feed pressure and the speeds before starting."],
    },
  ];
  if (stage.dwell) {
    const d = stage.dwell;
    cards.push({
      key: `dwell-${position}`, kind: "dwell", position, title: `${name} — dwell at the ${d.end}`, cautions: ["spindle", "guards", "clothing"], preset: d.doubleStrokes.nominal,
      figures: [
        { label: "Counter preset", value: `${d.doubleStrokes.nominal} double strokes` },
        { label: "Short stroke", value: setupLen(d.strokeLengthUm, units.setup) },
        { label: "Upper stop", value: fromDeck(d.upperReversal.stoneTopFromDeckUm, units.setup) },
        { label: "Lower stop", value: fromDeck(d.lowerReversal.stoneBottomFromDeckUm, units.setup) },
      ],
      lines: [`Short strokes at the tight ${d.end} take out the taper before the full strokes.`],
    });
  }
  const toCheckpoint = stage.checkpoint?.afterStrokes;
  cards.push({
    key: `run-${position}`, kind: "run", position, title: `${name} — run`, cautions: ["guards", "eyes", "clothing"], preset: toCheckpoint ?? stage.strokes.nominal,
    figures: [
      { label: "Counter preset", value: `${toCheckpoint ?? stage.strokes.nominal} double strokes` },
      { label: "Whole stage", value: `${stage.strokes.nominal} (${stage.strokes.low}–${stage.strokes.high}) double strokes` },
      { label: "Stock", value: len(stage.stockUm, units.small) },
    ],
    lines: [toCheckpoint ? "Run to the counter, then stop and measure." : "Run to the counter."],
  });
  if (stage.checkpoint) {
    cards.push({
      key: `measure-${position}`, kind: "measure", position, title: `${name} — stop and measure`, cautions: ["spindle"],
      figures: [
        { label: "Expected smallest", value: len(stage.checkpoint.expectedDiameterUm, units.size) },
        { label: "Stage goal", value: len(stage.goalUm, units.size) },
      ],
      lines: ["Withdraw the hone with the spindle stopped, clean the bore, and gauge every level in A and B."],
    });
  }
  return cards;
}

export function buildCards(input: CardInput): StepCard[] {
  const hone = input.stages.map((s, position) => ({ s, position })).filter((x): x is { s: HoneStage; position: number } => isHone(x.s));
  const first = hone[0]?.s;
  const setup = first?.strokeSetup;
  const { units } = input;
  const cards: StepCard[] = [
    {
      key: "mount", kind: "mount", position: null, title: "Mount and align the block", cautions: ["clothing"], figures: [],
      lines: [
        input.torquePlate ? "Fit the torque plate to the job's torque before mounting: this job is honed with it." : "No torque plate on this job.",
        "Mount the block square to the spindle and align the bore with the hone.",
      ],
    },
    {
      key: "stops", kind: "stops", position: null, title: "Set the stroke stops", cautions: ["stops"],
      figures: setup ? [
        { label: "Lower stop (stone bottom)", value: fromDeck(setup.lowerReversal.stoneBottomFromDeckUm, units.setup) },
        { label: "Upper stop (stone top)", value: fromDeck(setup.upperReversal.stoneTopFromDeckUm, units.setup) },
        { label: "Stroke", value: setupLen(setup.strokeLengthUm, units.setup) },
      ] : [],
      lines: ["Each stop is a distance from the deck, as the plan gives it."],
    },
    { key: "guards", kind: "guards", position: null, title: "Guards and oil on", cautions: ["guards", "oil", "eyes"], figures: [], lines: ["Close the guards and splash shields; honing oil flowing; mist extraction on."] },
    ...hone.flatMap(({ s, position }, i) => stageCards(s, position, i + 1, input)),
    {
      key: "final", kind: "final", position: null, title: "Final check", cautions: ["spindle"],
      figures: [
        { label: "Band", value: `${len(input.finalCheck.minUm, units.size)} – ${len(input.finalCheck.maxUm, units.size)}` },
        { label: "Target", value: len(input.finalCheck.targetUm, units.size) },
        { label: "Taper at most", value: len(input.finalCheck.taperToleranceUm, units.small) },
        { label: "Out-of-round at most", value: len(input.finalCheck.outOfRoundToleranceUm, units.small) },
      ],
      lines: ["Let the block come to the gauge's temperature, then gauge every level in A and B."],
    },
  ];
  return cards;
}
