import { tightestUm, type Profile } from "./profile";
import type { Checkpoint, DwellBlock, HoneStage, PlanHoneInput, StrokeEstimate } from "./plan-types";
import { ceilStrokes, floorStrokes, roundingOf, type StageRun } from "./sequence";
import type { StageShare } from "./stages";
import { DEFAULT_CHECKPOINT_MIN_STOCK_UM, planCheckpoint, rateUncertainty, STROKES_RULE, stoneWear } from "./strokes";
import type { PlanIssue } from "./warnings";

export { DEFAULT_CHECKPOINT_MIN_STOCK_UM };
/** One stroke taking more than half a stage's stock leaves no room to stop on size [C]. */
export const DEFAULT_MAX_STROKE_SHARE = 0.5;

export interface StageContext {
  input: PlanHoneInput;
  share: StageShare;
  run: StageRun;
  /** The bore before the stage, dwell included. */
  before: Profile;
  heightBeforeUm: number;
  /** The dwell this stage runs before its full strokes (first stage only). */
  dwell: DwellBlock | null;
}

/** The range the rate's uncertainty gives, rounded the way the stage rounds [D, DESIGN §5.4]. */
function strokeRange(run: StageRun, uncertaintyFraction: number): StrokeEstimate {
  const u = Math.min(Math.max(uncertaintyFraction, 0), 0.95);
  const round = run.spec.stopShort ? floorStrokes : ceilStrokes;
  const need = Number.isFinite(run.need) ? run.need : 0;
  const at = (x: number) => Math.max(round(x), run.spec.minStrokes);
  return { nominal: run.strokes, low: Math.min(at(need / (1 + u)), run.strokes), high: Math.max(at(need / (1 - u)), run.strokes), rule: STROKES_RULE };
}

function checkpointFor(ctx: StageContext, strokes: StrokeEstimate, fullStrokeStockUm: number): { checkpoint: Checkpoint | null; issue: PlanIssue | null } {
  const minStock = ctx.input.checkpointMinStockUm ?? DEFAULT_CHECKPOINT_MIN_STOCK_UM;
  if (fullStrokeStockUm <= minStock) return { checkpoint: null, issue: null };
  const checkpoint = planCheckpoint({ before: ctx.run.before, byLevelUm: ctx.run.spec.settings.byLevelUm, strokes, fraction: ctx.input.checkpointFraction });
  if (checkpoint) return { checkpoint, issue: null };
  return { checkpoint: null, issue: { code: "CHECKPOINT_NOT_POSSIBLE", severity: "warning", stage: ctx.share.kind, stockUm: fullStrokeStockUm,
    message: `The ${ctx.share.kind} stage is too few strokes for a checkpoint: lower the pressure or measure after every stroke.` } };
}

function coarseStrokeIssue(ctx: StageContext, removalUm: number, stockUm: number): PlanIssue[] {
  const share = ctx.input.maxStrokeShareOfStock ?? DEFAULT_MAX_STROKE_SHARE;
  if (stockUm <= 0 || removalUm <= share * stockUm) return [];
  return [{
    code: "STROKE_TOO_COARSE", severity: "warning", stage: ctx.share.kind, removalPerDoubleStrokeUm: removalUm, stockUm, maxShare: share,
    message: `One ${ctx.share.kind} stroke removes ${removalUm.toFixed(1)} µm of a ${stockUm.toFixed(1)} µm stage: lower the pressure so the stage can stop on size.`,
  }];
}

/** One honing stage from its whole-stroke run: strokes, checkpoint, dwell, settings and stone wear [DESIGN §5.3–5.5]. */
export function buildHoneStage(ctx: StageContext): { stage: HoneStage; issues: PlanIssue[] } {
  const { input, share, run, dwell } = ctx;
  const { stone, settings } = run.spec;
  const removalUm = settings.removal.removalPerDoubleStrokeUm;
  const diameterBeforeUm = tightestUm(ctx.before);
  const afterUm = tightestUm(run.after);
  const fullStrokeStockUm = afterUm - tightestUm(run.before);
  const strokes = strokeRange(run, rateUncertainty(stone));
  const issues: PlanIssue[] = [...settings.issues, ...coarseStrokeIssue(ctx, removalUm, fullStrokeStockUm)];
  const { checkpoint, issue } = checkpointFor(ctx, strokes, fullStrokeStockUm);
  if (issue) issues.push(issue);
  const wear = stoneWear({
    stone, fullStrokeStockUm: run.strokes * removalUm, boreLengthUm: input.boreLengthUm, dwellStockUm: dwell?.stockUm ?? 0,
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
    kind: share.kind, stoneId: stone.id, stockUm: afterUm - diameterBeforeUm, fullStrokeStockUm, goalUm: run.spec.goalUm,
    diameterBeforeUm, expectedDiameterAfterUm: afterUm, expectedByLevel: run.after, removalByLevelUm: settings.byLevelUm,
    cleanup: { requiredUm: share.cleanupRequiredUm, marksOf: share.marksOf, rule: "a stage removes at least the clean-up stock of the one before [C, DESIGN §5.3]" },
    removal: settings.removal, strokes, checkpoint, pressure: settings.pressure, speeds: settings.speeds,
    strokeSetup: settings.setup, dwell, stoneWear: wear, rounding: roundingOf(run.spec),
    rule: share.kind === "plateau" ? "plateau: small fixed stock that takes the peaks and keeps the valleys [C]" : "stage stock per DESIGN §5.3",
  };
  return { stage, issues };
}
