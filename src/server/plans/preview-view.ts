import "server-only";
import type { HonePlan, HoneStage, PlanStage } from "@/lib/honing";

// What the wizard shows of a plan and nothing more. The saved plan keeps everything (rule texts, removal
// factors, the profile at every level after every stage); the live preview, sent on every change, carries
// about a third of it, so a varied request costs less to serialize and to compress (issue 11, part 5).
// A wizard screen that needs another figure adds it here.

function honeStageView(s: HoneStage) {
  return {
    kind: s.kind, stoneId: s.stoneId, stockUm: s.stockUm, diameterBeforeUm: s.diameterBeforeUm, expectedDiameterAfterUm: s.expectedDiameterAfterUm,
    strokes: { nominal: s.strokes.nominal, low: s.strokes.low, high: s.strokes.high },
    checkpoint: s.checkpoint && { afterStrokes: s.checkpoint.afterStrokes, expectedDiameterUm: s.checkpoint.expectedDiameterUm },
    pressure: s.pressure,
    removal: { removalPerDoubleStrokeUm: s.removal.removalPerDoubleStrokeUm, learnedMultiplier: s.removal.learnedMultiplier },
    speeds: {
      targetAngleDeg: s.speeds.targetAngleDeg, includedAngleDeg: s.speeds.includedAngleDeg, spindleRpm: s.speeds.spindleRpm,
      doubleStrokesPerMin: s.speeds.doubleStrokesPerMin, peripheralSpeed: s.speeds.peripheralSpeed, axialSpeed: s.speeds.axialSpeed,
      cuttingSpeed: s.speeds.cuttingSpeed, drive: s.speeds.drive, choiceRule: s.speeds.choiceRule,
    },
    strokeSetup: {
      strokeLengthUm: s.strokeSetup.strokeLengthUm, overtravelTopUm: s.strokeSetup.overtravelTopUm, overtravelBottomUm: s.strokeSetup.overtravelBottomUm,
      upperReversal: s.strokeSetup.upperReversal, lowerReversal: s.strokeSetup.lowerReversal, boreLengthUm: s.strokeSetup.boreLengthUm,
      stoneLengthUm: s.strokeSetup.stoneLengthUm,
    },
    dwell: s.dwell && { end: s.dwell.end, stockUm: s.dwell.stockUm },
    stoneWear: { heightAfterUm: s.stoneWear.heightAfterUm, wearLimitHeightUm: s.stoneWear.wearLimitHeightUm },
  };
}

function stageView(s: PlanStage) {
  if (s.kind === "bore") return { kind: s.kind, boreToUm: s.boreToUm, stockUm: s.stockUm, diameterBeforeUm: s.diameterBeforeUm, honingAllowanceUm: s.honingAllowanceUm };
  return honeStageView(s);
}

export function planView(plan: HonePlan) {
  const { sizing, geometry, stock } = plan;
  return {
    status: plan.status, canRelease: plan.canRelease,
    sizing: sizing && {
      targetUm: sizing.targetUm, minUm: sizing.minUm, maxUm: sizing.maxUm, pistonDiameterUm: sizing.pistonDiameterUm, clearanceTargetUm: sizing.clearanceTargetUm,
      performanceAllowanceUm: sizing.performanceAllowanceUm, bandWideningUm: sizing.bandWideningUm,
    },
    geometry: geometry && {
      minUm: geometry.minUm, maxUm: geometry.maxUm, minAt: geometry.minAt, maxAt: geometry.maxAt, taperUm: geometry.taperUm, taperDirection: geometry.taperDirection,
      outOfRoundUm: geometry.outOfRoundUm, outOfRoundLevel: geometry.outOfRoundLevel, tightEnd: geometry.tightEnd,
    },
    stock: stock && { totalUm: stock.totalUm, boringUm: stock.boringUm, honingUm: stock.honingUm, startDiameterUm: stock.startDiameterUm },
    stages: plan.stages.map(stageView),
    finalCheck: plan.finalCheck,
    issues: plan.issues, errors: plan.errors, warnings: plan.warnings,
  };
}
/** The full plan (a saved one) is a PlanView too: components typed with these show both. */
export type PlanView = ReturnType<typeof planView>;
export type StageView = ReturnType<typeof stageView>;
export type HoneStageView = ReturnType<typeof honeStageView>;
