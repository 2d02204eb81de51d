// What a block of strokes and its reading mean, worked out the same way on the device (offline) and on
// the server (authoritative): the reading corrected to 20 °C, then re-estimated by src/lib/honing.
import {
  EXPANSION_UM_PER_M_K, levelsAt20C, reestimateAtCheckpoint,
  type FinalCheck, type HoneStage, type PlanStage, type Reestimate, type ReadingLevel, type Temperatures,
} from "@/lib/honing";
import type { RunOutcome } from "./constants";

export type BoreMaterialCode = keyof typeof EXPANSION_UM_PER_M_K;

export const isHone = (s: PlanStage): s is HoneStage => s.kind !== "bore";

/** A reading set as the bore would be at 20 °C; unchanged when no temperatures were given. */
export function correctedLevels(levels: readonly ReadingLevel[], temperatures: Temperatures | null, material: BoreMaterialCode): ReadingLevel[] {
  return temperatures ? levelsAt20C(levels, temperatures, EXPANSION_UM_PER_M_K[material]) : levels.map((l) => ({ ...l }));
}

export interface BlockContext {
  stages: readonly PlanStage[];
  position: number;
  finalCheck: FinalCheck;
  /** Strokes of this stage's full-stroke blocks before this one. */
  strokesBefore: number;
}

/** Clean-up stock the stages after this one still owe: the least they will remove. */
export function laterStockUm(stages: readonly PlanStage[], position: number): number {
  return stages.slice(position + 1).filter(isHone).reduce((sum, s) => sum + s.cleanup.requiredUm, 0);
}

/** The outcome of a block: without a reading the stage is done (or, for a dwell, continues); with one, the re-estimate decides. */
export function blockOutcome(ctx: BlockContext, block: { kind: "full" | "dwell"; strokesDone: number; levels20C: readonly ReadingLevel[] | null }): { outcome: RunOutcome; reestimate: Reestimate | null } {
  const stage = ctx.stages[ctx.position];
  if (!stage || !isHone(stage)) throw new Error("That stage is not a honing stage.");
  if (!block.levels20C) return { outcome: block.kind === "dwell" ? "checkpoint" : "done", reestimate: null };
  const reestimate = reestimateAtCheckpoint({
    stage, levels: block.levels20C, strokesDone: ctx.strokesBefore + (block.kind === "full" ? block.strokesDone : 0),
    bandMaxUm: ctx.finalCheck.maxUm, laterStockUm: laterStockUm(ctx.stages, ctx.position), taperToleranceUm: ctx.finalCheck.taperToleranceUm,
  });
  const outcome: RunOutcome = reestimate.action === "stop_call_machinist" ? "stopped" : reestimate.action === "stage_done" ? "done" : "checkpoint";
  return { outcome, reestimate };
}

export type CylinderState = "not_started" | "in_stage" | "waiting_reading" | "stopped" | "inspect" | "passed" | "failed";

export const CYLINDER_STATE_LABELS: Record<CylinderState, string> = {
  not_started: "Not started",
  in_stage: "In a stage",
  waiting_reading: "Waiting for a reading",
  stopped: "Stopped: call the machinist",
  inspect: "Final check",
  passed: "Done, passed",
  failed: "Failed its check",
};

export interface CylinderProgress {
  state: CylinderState;
  /** The honing stage to work on, 1-based among the honing stages, or null when all are done. */
  stageNumber: number | null;
  stageCount: number;
  /** Plan position of that stage. */
  position: number | null;
}

/** Where a cylinder stands, from its logged runs and its last final inspection. */
export function cylinderProgress(
  stages: readonly PlanStage[],
  runs: readonly { stagePosition: number; outcome: RunOutcome; readingTaken: boolean }[],
  lastVerdict: "pass" | "fail" | "held" | null,
): CylinderProgress {
  const hone = stages.map((s, position) => ({ s, position })).filter((x) => isHone(x.s));
  const stageCount = hone.length;
  if (runs.some((r) => r.outcome === "stopped")) {
    const stopped = runs.find((r) => r.outcome === "stopped")!;
    return { state: "stopped", stageNumber: hone.findIndex((h) => h.position === stopped.stagePosition) + 1, stageCount, position: stopped.stagePosition };
  }
  const open = hone.findIndex((h) => !runs.some((r) => r.stagePosition === h.position && r.outcome === "done"));
  if (open === -1) {
    const state: CylinderState = lastVerdict === "pass" ? "passed" : lastVerdict === "fail" ? "failed" : "inspect";
    return { state, stageNumber: null, stageCount, position: null };
  }
  const position = hone[open]!.position;
  const started = runs.some((r) => r.stagePosition === position) || open > 0;
  // A dwell logged without a reading leaves the stage waiting for its checkpoint reading.
  const last = runs.filter((r) => r.stagePosition === position).at(-1);
  const state: CylinderState = !started ? "not_started" : last && !last.readingTaken ? "waiting_reading" : "in_stage";
  return { state, stageNumber: open + 1, stageCount, position };
}
