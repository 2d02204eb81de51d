import { requireNumber } from "./errors";

// Spindle time from the plan: a stage runs its double strokes at the stage's double strokes per
// minute; a cylinder adds its set-up and one stone change before every stage that changes the stone;
// a job adds its own set-up (e.g. a torque plate) once.
export type TimedStage = { doubleStrokes: number; doubleStrokesPerMin: number; stoneId: string | null };
export type TimeAllowances = { cylinderSetUpMin: number; stoneChangeMin: number; jobSetUpMin: number };

export function stageMinutes(stage: Pick<TimedStage, "doubleStrokes" | "doubleStrokesPerMin">): number {
  const strokes = requireNumber("doubleStrokes", stage.doubleStrokes, 0, 1_000_000);
  const rate = requireNumber("doubleStrokesPerMin", stage.doubleStrokesPerMin, 1e-9, 10_000);
  return strokes / rate;
}

export type CylinderTime = { spindleMin: number; stoneChanges: number; allowanceMin: number; totalMin: number };

export function cylinderMinutes(stages: readonly TimedStage[], allowances: Pick<TimeAllowances, "cylinderSetUpMin" | "stoneChangeMin">): CylinderTime {
  const setUp = requireNumber("cylinderSetUpMin", allowances.cylinderSetUpMin, 0, 600);
  const change = requireNumber("stoneChangeMin", allowances.stoneChangeMin, 0, 600);
  let spindleMin = 0;
  let stoneChanges = 0;
  let previous: string | null = null;
  for (const stage of stages) {
    spindleMin += stageMinutes(stage);
    if (previous !== null && stage.stoneId !== null && stage.stoneId !== previous) stoneChanges++;
    if (stage.stoneId !== null) previous = stage.stoneId;
  }
  const allowanceMin = setUp + stoneChanges * change;
  return { spindleMin, stoneChanges, allowanceMin, totalMin: spindleMin + allowanceMin };
}

export type JobTime = { cylinders: CylinderTime[]; jobSetUpMin: number; totalMin: number };

export function jobMinutes(cylinders: readonly (readonly TimedStage[])[], allowances: TimeAllowances): JobTime {
  const jobSetUpMin = requireNumber("jobSetUpMin", allowances.jobSetUpMin, 0, 6000);
  const each = cylinders.map((stages) => cylinderMinutes(stages, allowances));
  return { cylinders: each, jobSetUpMin, totalMin: jobSetUpMin + each.reduce((s, c) => s + c.totalMin, 0) };
}

/** Minutes as billable thousandths of an hour, rounded half up (common practice: bill what the clock shows). */
export function minutesToHourMilli(minutes: number): number {
  requireNumber("minutes", minutes, 0, 1_000_000);
  return Math.round((minutes * 1000) / 60);
}
