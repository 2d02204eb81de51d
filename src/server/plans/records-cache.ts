import "server-only";
import type { Actor } from "@/shared/auth/policy";
import { assertCanLoadPlanningRecords, loadJobPlanningRecords, type JobPlanningRecords } from "./records";
import { readPlanningVersion } from "./planning-version";

// Planning records per (shop, job, machine), kept while the shop's planning counter is unchanged: any
// write to a table they come from raises the counter (a database trigger), so a kept entry is never
// older than the database. Entries are frozen: a caller that tried to change one would fail loudly.

const MAX_ENTRIES = 64; // a few tens of KB each for an eight-cylinder job
const kept = new Map<string, { version: number; records: JobPlanningRecords }>();

function deepFreeze<T>(value: T): T {
  if (value && typeof value === "object" && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const inner of Object.values(value)) deepFreeze(inner);
  }
  return value;
}

function keep(key: string, entry: { version: number; records: JobPlanningRecords }) {
  kept.delete(key); // most recently used last
  kept.set(key, entry);
  if (kept.size > MAX_ENTRIES) kept.delete(kept.keys().next().value!);
}

/** The records of a version already read by the caller (see currentPlanningRecords for the order). */
export async function planningRecordsAt(
  { actor, jobId, machineId }: { actor: Actor; jobId: string; machineId: string },
  version: number,
): Promise<JobPlanningRecords> {
  const key = `${actor.shopId}\n${jobId}\n${machineId}`;
  const hit = kept.get(key);
  if (hit && hit.version === version) {
    assertCanLoadPlanningRecords(actor);
    keep(key, hit);
    return hit.records;
  }
  const records = deepFreeze(await loadJobPlanningRecords({ actor, jobId, machineId }));
  keep(key, { version, records });
  return records;
}

/** The shop's planning counter and the job's planning records, at least as new as that counter. */
export async function currentPlanningRecords(args: { actor: Actor; jobId: string; machineId: string }) {
  assertCanLoadPlanningRecords(args.actor);
  // Counter BEFORE records: a write landing between the two then leaves records newer than the counter they are kept under (harmless), never older.
  const version = await readPlanningVersion(args.actor.shopId);
  return { version, records: await planningRecordsAt(args, version) };
}
