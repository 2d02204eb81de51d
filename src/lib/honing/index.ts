/**
 * Borewise honing computation: pure TypeScript, no I/O. All lengths µm, speeds m/min,
 * angles degrees. Design: DESIGN.md §5; facts and sources: reference/trade-facts.md.
 */
export * from "./types";
export { HoningInputError } from "./errors";
export { parseLength, formatLength, formatOversizeStep, toUm, fromUm, UM_PER_INCH, UM_PER_THOU, UM_PER_MM, MAX_LENGTH_UM } from "./units";
export type { ParseLengthResult } from "./units";
export { finishedBore, checkClearance, commonClearanceBand, SIZING_RULE } from "./sizing";
export type { FinishedBore, FinishedBoreInput, ClearanceVerdict, ClearanceBand } from "./sizing";
export { boreGeometry, geometryVerdict, readingPoints, DEFAULT_FINISHED_TOLERANCES } from "./geometry";
export type { BoreGeometry, GeometryTolerances, ReadingPoint } from "./geometry";
export {
  crosshatchAngle, strokeRateForAngle, peripheralSpeedMPerMin, axialSpeedMPerMin,
  CUTTING_SPEED_RANGE_M_PER_MIN, DEFAULT_CROSSHATCH_DEG,
} from "./crosshatch";
export type { Crosshatch, CrosshatchInput, StrokeRateInput } from "./crosshatch";
export { chooseSpeeds } from "./speeds";
export type { MachineInput, SpeedChoice } from "./speeds";
export { strokeSetup, DEFAULT_OVERTRAVEL_FRACTION } from "./stroke-setup";
export type { StrokeSetup, StrokeSetupInput, Reversal } from "./stroke-setup";
export { estimateStrokes, remainingStrokes, cleanupStockOf, stoneWear, DEFAULT_CHECKPOINT_FRACTION } from "./strokes";
export { removalPerDoubleStroke, contactLengthUm, contactShares, levelDepthsUm, ruleBlock, REMOVAL_RULE } from "./removal";
export type { StrokeBlock } from "./removal";
export { profileTaperUm, tightestUm, largestUm } from "./profile";
export type { LevelDiameter, Profile } from "./profile";
export {
  honingAllowance, plateauStockOf, ALLOWANCE_RULE, DEFAULT_AS_RECEIVED_CLEANUP_UM, DEFAULT_BORING_RZ_UM, DEFAULT_BORE_ABOVE_STOCK_UM, DEFAULT_BORING_MARGIN_UM,
} from "./allowance";
export type { HoningAllowance, HoningAllowanceInput } from "./allowance";
export { splitStock } from "./stages";
export type { StageSplit, StageShare, StageSplitInput, CuttingStone } from "./stages";
export { planTaperCorrection, dwellStockUm, taperToCorrect, DEFAULT_TAPER_TOLERANCE_UM } from "./taper";
export { planHone, DEFAULT_PLATEAU_STOCK_UM, DEFAULT_MAX_HONING_STOCK_UM } from "./plan";
export { planHoneJob } from "./job";
export type { PlanJobInput, JobPlan, JobCylinderInput } from "./job";
export type * from "./plan-types";
export { chooseOversize } from "./oversize";
export type { ChooseOversizeInput, ChooseOversizeResult } from "./oversize";
export { matchPistons, MATCH_RULE, MAX_MATCH_COUNT } from "./match-pistons";
export type { MatchPistonsInput, MatchPistonsResult, PistonPair } from "./match-pistons";
export { parseGrit, formatGrit, gritGrainSizeUm, gritRow, validGritNumbers, GRIT_SCALES, GRIT_NUMBERS } from "./grit";
export type { Grit, GritScale, GritRow, GritScaleInfo, ParseGritResult } from "./grit";
export type { PlanIssue, PlanIssueCode, BoreOverTargetChoice } from "./warnings";
export { isError } from "./warnings";
export { sizeJob, boreFirst } from "./sizing-story";
export type { JobSizing, JobSizingInput } from "./sizing-story";
export { emptyLearnedState, learnMultiplier, multiplierFromState, updateLearnedState, observedLogMultiplier, LEARNING_DEFAULTS, LEARNING_RULE } from "./learning";
export type { LearnedMultiplier, LearnedState, LearningOptions, LearningRun } from "./learning";
export { processCapability, capabilityVerdict, normalCdf, outsideShare, oneIn, histogram, CAPABILITY_RULE } from "./capability";
export type { Capability } from "./capability";
export { medianAbsoluteError } from "./prediction";
export { reestimateAtCheckpoint, REESTIMATE_RULE } from "./reestimate";
export type { Reestimate, ReestimateInput, CheckpointAction, CheckpointDwell } from "./reestimate";
export { diameterAt20C, levelsAt20C, temperatureSettled, EXPANSION_UM_PER_M_K, REFERENCE_TEMPERATURE_C, DEFAULT_MAX_TEMPERATURE_DIFFERENCE_K, THERMAL_RULE } from "./thermal";
export type { Temperatures } from "./thermal";
export { inspectCylinder, inspectJob, SURFACE_PARAMETERS, SURFACE_LABELS, INSPECTION_RULE } from "./inspection";
export type { CylinderVerdict, InspectionFailure, InspectionInput, InspectionCheck, SurfaceParameter, SurfaceReading, SurfaceTargets } from "./inspection";
