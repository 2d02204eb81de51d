import { chooseSpeeds } from "./speeds";
import { strokeSetup } from "./stroke-setup";
import { estimateStrokes, planCheckpoint, removalPerDoubleStroke, stoneWear } from "./strokes";
import { planDwell } from "./taper";
import type { DwellBlock, HoneStage, PlanHoneInput, StoneInput } from "./plan-types";
import type { StageShare } from "./stages";
import type { PlanIssue } from "./warnings";
import { DEFAULT_CHECKPOINT_FRACTION } from "./strokes";
import { DEFAULT_CROSSHATCH_DEG } from "./crosshatch";

export const DEFAULT_CHECKPOINT_MIN_STOCK_UM = 5;

/** The settings a stage runs with: stroke set-up for its stone, pressure, rate and speeds. */
export function stageSettings(input: PlanHoneInput, stone: StoneInput, boreDiameterUm: number) {
  const setup = strokeSetup({
    boreLengthUm: input.boreLengthUm,
    stoneLengthUm: stone.stoneLengthUm,
    ...(input.overtravelFraction !== undefined && { overtravelFraction: input.overtravelFraction }),
    ...(input.bottomClearanceUm !== undefined && { maxBottomOvertravelUm: input.bottomClearanceUm }),
  });
  const pressure = input.pressures?.[stone.role] ?? stone.rate.referencePressure;
  const removal = removalPerDoubleStroke({ stone, pressure, strokeLengthUm: setup.strokeLengthUm });
  const speeds = chooseSpeeds({
    boreDiameterUm,
    strokeLengthUm: Math.max(setup.strokeLengthUm, 1),
    targetAngleDeg: input.targetCrosshatchDeg ?? DEFAULT_CROSSHATCH_DEG,
    machine: input.machine,
  });
  const issues: PlanIssue[] = [...setup.warnings, ...speeds.issues];
  if (setup.strokeLengthUm > input.machine.maxStrokeLengthUm) {
    issues.push({
      code: "STROKE_ABOVE_MACHINE", severity: "error", strokeLengthUm: setup.strokeLengthUm, maxStrokeLengthUm: input.machine.maxStrokeLengthUm,
      message: "The stroke this bore needs is longer than the machine's maximum stroke.",
    });
  }
  return { setup, pressure, removal, speeds, issues };
}

export interface StageContext {
  input: PlanHoneInput;
  share: StageShare;
  stone: StoneInput;
  diameterBeforeUm: number;
  heightBeforeUm: number;
  /** Taper the stage corrects with a dwell block before its full strokes (first stage only). */
  taper: { end: "top" | "bottom"; stockUm: number } | null;
}

function checkpointFor(ctx: StageContext, stage: Pick<HoneStage, "strokes" | "fullStrokeStockUm">, removalUm: number, dwell: DwellBlock | null) {
  const minStock = ctx.input.checkpointMinStockUm ?? DEFAULT_CHECKPOINT_MIN_STOCK_UM;
  if (stage.fullStrokeStockUm <= minStock) return { checkpoint: null, issue: null };
  const checkpoint = planCheckpoint({
    strokes: stage.strokes,
    fraction: ctx.input.checkpointFraction ?? DEFAULT_CHECKPOINT_FRACTION,
    diameterBeforeUm: ctx.diameterBeforeUm + (dwell?.stockUm ?? 0),
    removalUm,
  });
  const issue: PlanIssue | null = checkpoint
    ? null
    : { code: "CHECKPOINT_NOT_POSSIBLE", severity: "warning", stage: ctx.share.kind, stockUm: stage.fullStrokeStockUm,
        message: `The ${ctx.share.kind} stage is too few strokes for a checkpoint: lower the pressure or measure after every stroke.` };
  return { checkpoint, issue };
}

/** One honing stage: strokes, checkpoint, dwell, settings and stone wear [DESIGN §5.3–5.5]. */
export function buildHoneStage(ctx: StageContext): { stage: HoneStage; issues: PlanIssue[] } {
  const { input, share, stone } = ctx;
  const settings = stageSettings(input, stone, ctx.diameterBeforeUm);
  const issues = [...settings.issues];
  const dwell = ctx.taper && planDwell({
    ...ctx.taper, stone, pressure: settings.pressure, setup: settings.setup,
    ...(input.dwellStrokeLengthUm !== undefined && { dwellStrokeLengthUm: input.dwellStrokeLengthUm }),
  });
  const removalUm = settings.removal.removalPerDoubleStrokeUm;
  const fullStrokeStockUm = share.stockUm;
  const stockUm = share.stockUm + (dwell?.stockUm ?? 0);
  const strokes = estimateStrokes(fullStrokeStockUm, removalUm, stone.rate.uncertaintyFraction);
  const { checkpoint, issue } = checkpointFor(ctx, { strokes, fullStrokeStockUm }, removalUm, dwell);
  if (issue) issues.push(issue);
  const wear = stoneWear({
    stone, fullStrokeStockUm, boreLengthUm: input.boreLengthUm, dwellStockUm: dwell?.stockUm ?? 0,
    dwellZoneLengthUm: dwell ? dwell.strokeLengthUm + stone.stoneLengthUm : 0, heightBeforeUm: ctx.heightBeforeUm,
  });
  if (wear.heightAfterUm < stone.wearLimitHeightUm) {
    issues.push({
      code: "STONE_WEAR_LIMIT", severity: "warning", stoneId: stone.id, stage: share.kind, heightBeforeUm: wear.heightBeforeUm,
      heightAfterUm: wear.heightAfterUm, wearLimitHeightUm: stone.wearLimitHeightUm,
      message: `Stone ${stone.id} would wear below its limit in the ${share.kind} stage: change or dress it first.`,
    });
  }
  const stage: HoneStage = {
    kind: share.kind, stoneId: stone.id, stockUm, fullStrokeStockUm,
    diameterBeforeUm: ctx.diameterBeforeUm, expectedDiameterAfterUm: ctx.diameterBeforeUm + stockUm,
    cleanup: { requiredUm: share.cleanupRequiredUm, marksOf: share.marksOf, rule: "a stage removes at least the clean-up stock of the one before [C, DESIGN §5.3]" },
    removal: settings.removal, strokes, checkpoint, pressure: settings.pressure, speeds: settings.speeds,
    strokeSetup: settings.setup, dwell, stoneWear: wear,
    rule: share.kind === "plateau" ? "plateau: small fixed stock that takes the peaks and keeps the valleys [C]" : "stage stock per DESIGN §5.3",
  };
  return { stage, issues };
}
