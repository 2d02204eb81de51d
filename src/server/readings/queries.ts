import "server-only";
import { and, asc, desc, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { readingSets, readings, users } from "@/server/db/schema";
import type { ReadingKind } from "@/shared/jobs/constants";

export type ReadingSetView = {
  id: string;
  cylinderId: string;
  kind: ReadingKind;
  gauge: string | null;
  temperatureC: number | null;
  source: "manual" | "csv";
  takenAt: string;
  takenByName: string | null;
  levels: Array<{ name: string; aUm: number; bUm: number }>;
};

/** Every reading set of a job, newest first, with its levels in order from the deck down. */
export async function listReadingSets({ shopId, jobId }: { shopId: string; jobId: string }): Promise<ReadingSetView[]> {
  const sets = await db
    .select({
      id: readingSets.id, cylinderId: readingSets.cylinderId, kind: readingSets.kind, gauge: readingSets.gauge,
      temperatureC: readingSets.temperatureC, source: readingSets.source, takenAt: readingSets.takenAt, takenByName: users.name,
    })
    .from(readingSets)
    .leftJoin(users, eq(users.id, readingSets.takenBy))
    .where(and(eq(readingSets.jobId, jobId), eq(readingSets.shopId, shopId)))
    .orderBy(desc(readingSets.takenAt), desc(readingSets.id));
  const points = await db
    .select({ readingSetId: readings.readingSetId, levelIndex: readings.levelIndex, level: readings.level, direction: readings.direction, diameterUm: readings.diameterUm })
    .from(readings)
    .innerJoin(readingSets, eq(readingSets.id, readings.readingSetId))
    .where(and(eq(readingSets.jobId, jobId), eq(readings.shopId, shopId)))
    .orderBy(asc(readings.levelIndex));
  return toReadingSetViews(sets, points);
}

type PointRow = { readingSetId: string; levelIndex: number; level: string; direction: "A" | "B"; diameterUm: number };

/** Reading sets (newest first) with their points (in level order) folded into levels; shared by combined loaders. */
export function toReadingSetViews<S extends { id: string; takenAt: Date }>(sets: S[], points: PointRow[]): Array<Omit<S, "takenAt"> & { takenAt: string; levels: ReadingSetView["levels"] }> {
  const levelsBySet = new Map<string, Map<number, { name: string; aUm: number; bUm: number }>>();
  for (const p of points) {
    const levels = levelsBySet.get(p.readingSetId) ?? new Map();
    levelsBySet.set(p.readingSetId, levels);
    const level = levels.get(p.levelIndex) ?? { name: p.level, aUm: 0, bUm: 0 };
    level[p.direction === "A" ? "aUm" : "bUm"] = p.diameterUm;
    levels.set(p.levelIndex, level);
  }
  return sets.map((s) => ({ ...s, takenAt: s.takenAt.toISOString(), levels: [...(levelsBySet.get(s.id)?.values() ?? [])] }));
}
