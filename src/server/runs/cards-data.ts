import "server-only";
import type { FloorCylinderData } from "@/shared/floor/cylinder-data";
import type { Actor } from "@/shared/auth/policy";
import { buildCards, cardUnits } from "@/shared/floor/cards";
import { cylinderProgress, isHone } from "@/shared/floor/outcome";
import type { CylinderVerdict } from "@/lib/honing";
import { fromJson } from "@/server/plans/store";
import { loadFloorCylinder, mayLogOn, runView } from "./load";
import { getFloorSettings } from "@/server/shop-settings/floor";

/** The reason the last stopped run gave (its re-estimate says what was past the band and to call the machinist). */
function stopNoteOf(runs: ReturnType<typeof runView>[]): string | null {
  const stopped = [...runs].reverse().find((r) => r.outcome === "stopped");
  return stopped?.reestimate?.reason ?? null;
}

/** Everything the step cards of one cylinder show, as plain data for the client. */
export async function floorCylinderData({ actor, planId, cylinder, unitSystem }: { actor: Actor; planId: string; cylinder: number; unitSystem: "metric" | "inch" }): Promise<FloorCylinderData> {
  const loaded = await loadFloorCylinder({ actor, planId, cylinder });
  const units = cardUnits(unitSystem);
  const cards = buildCards({
    stages: loaded.stages, finalCheck: loaded.finalCheck, torquePlate: loaded.job.torquePlate, units,
    stones: loaded.stoneRows.map((s) => ({ id: s.id, code: s.code, currentHeightUm: s.currentHeightUm, wearLimitHeightUm: s.wearLimitHeightUm })),
    pressureUnit: loaded.summary.machine.pressureUnit,
  });
  const views = loaded.runRows.map(runView);
  const progress = cylinderProgress(loaded.stages, views, loaded.inspection?.status ?? null);
  const startIndex = progress.position === null
    ? cards.findIndex((c) => c.kind === "final")
    : Math.max(0, progress.state === "not_started" ? 0 : cards.findIndex((c) => c.position === progress.position));
  const loggedStrokes: Record<number, number> = {};
  for (const r of views) if (r.block === "full") loggedStrokes[r.stagePosition] = (loggedStrokes[r.stagePosition] ?? 0) + r.strokesDone;
  const firstHone = loaded.stages.find(isHone);
  return {
    planId, cylinder, heading: `Job #${loaded.job.number} · cylinder ${cylinder}`, boreMaterial: loaded.boreMaterial,
    levelNames: loaded.finalCheck.levels.length > 0 ? loaded.finalCheck.levels : (firstHone?.expectedByLevel.map((l) => l.level) ?? []),
    stages: loaded.stages, finalCheck: loaded.finalCheck,
    sizing: { minUm: loaded.sizing.minUm, maxUm: loaded.sizing.maxUm, pistonDiameterUm: loaded.sizing.pistonDiameterUm, clearanceMinUm: loaded.sizing.clearanceMinUm, clearanceMaxUm: loaded.sizing.clearanceMaxUm },
    cards, startIndex, loggedStrokes, stopped: progress.state === "stopped",
    verdict: loaded.inspection ? fromJson<CylinderVerdict>(loaded.inspection.verdict) : null,
    units, mayLog: mayLogOn(actor, loaded.job, loaded.cylinderRow),
    floorSettings: await getFloorSettings({ shopId: actor.shopId }), stopNote: progress.state === "stopped" ? stopNoteOf(views) : null,
  };
}
