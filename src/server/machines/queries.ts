import "server-only";
import { and, asc, desc, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { machines, type Machine } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { notFound } from "@/server/errors";

export function toMachineView(m: Machine) {
  return {
    id: m.id, name: m.name, spindleRpmMin: m.spindleRpmMin, spindleRpmMax: m.spindleRpmMax,
    doubleStrokesPerMinMin: m.doubleStrokesPerMinMin, doubleStrokesPerMinMax: m.doubleStrokesPerMinMax,
    maxStrokeLengthUm: m.maxStrokeLengthUm, drive: m.drive, pressureUnit: m.pressureUnit,
    pressureMin: m.pressureMin, pressureMax: m.pressureMax, headStoneLengthUm: m.headStoneLengthUm,
    notes: m.notes, active: m.active, isDemo: m.isDemo, updatedAt: m.updatedAt,
  };
}
export type MachineView = ReturnType<typeof toMachineView>;

/** The shop's machines, active first. */
export async function listMachines({ actor }: { actor: Actor }): Promise<MachineView[]> {
  assertCan(actor, "machines.view");
  const rows = await db.select().from(machines).where(eq(machines.shopId, actor.shopId)).orderBy(desc(machines.active), asc(machines.name));
  return rows.map(toMachineView);
}

/** One machine; another shop's machine is "not found". */
export async function getMachine({ actor, machineId }: { actor: Actor; machineId: string }): Promise<MachineView> {
  assertCan(actor, "machines.view");
  const [row] = await db.select().from(machines).where(and(eq(machines.id, machineId), eq(machines.shopId, actor.shopId))).limit(1);
  if (!row) throw notFound("That machine");
  return toMachineView(row);
}
