import "server-only";
import type { BoreMaterial } from "@/lib/bore-materials";
import type { LearnedState } from "@/lib/honing";
import { pool, type Tx } from "@/server/db";
import { executeRaw } from "@/server/db/raw";
import type { Job, RateRow, Stone } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { AppError, notFound } from "@/server/errors";
import type { ReadingKind } from "@/shared/jobs/constants";
import { toReadingSetViews } from "@/server/readings/queries";
import type { PistonView, ReadingSetView } from "./cylinders";
import { DEFAULT_SHOP_SETTINGS, type ShopSettings } from "@/shared/shop-settings/schema";
import type { PressureUnit } from "@/shared/stones/constants";
import type { Machine } from "@/server/db/schema";

// Everything a job plan rests on in ONE round trip: the preview runs on every keystroke (debounced),
// and measured under load each extra query cost more than planning itself (socket write, driver, SQL
// build, server CPU). Each column is one JSON document, shop-scoped and ordered exactly like the
// query function it stands for (named beside it). records-cache.ts keeps the result per shop's
// planning counter (raised by triggers on every table read here: add one for any new table).

// Tiny row counts: index-merge intersections and rowid filters (the optimizer's picks here) cost
// more than they save (measured: about a fifth of this statement's server CPU).
// JSON_ARRAYAGG is built like GROUP_CONCAT and cut at group_concat_max_len (1 MiB by default, MariaDB
// KB "group_concat_max_len"): 16 MiB, the default max_allowed_packet, is far above the per-parent bounds
// in db/bounds.ts allow.
export const PLANNING_JSON_MAX_BYTES = 16 * 1024 * 1024;
const SQL = `SET STATEMENT optimizer_switch='index_merge=off,rowid_filter=off', group_concat_max_len=${PLANNING_JSON_MAX_BYTES} FOR SELECT
  (SELECT JSON_OBJECT('id', j.id, 'number', j.number, 'engineDescription', j.engine_description, 'boreMaterial', j.bore_material,
      'cylinderCount', j.cylinder_count, 'standardBoreUm', j.standard_bore_um, 'boreLengthUm', j.bore_length_um, 'bottomClearanceUm', j.bottom_clearance_um)
    FROM jobs j WHERE j.id = ? AND j.shop_id = ?) AS job,
  (SELECT JSON_ARRAYAGG(JSON_OBJECT('id', c.id, 'number', c.number) ORDER BY c.number)
    FROM cylinders c WHERE c.job_id = ? AND c.shop_id = ?) AS cylinders,
  (SELECT JSON_ARRAYAGG(JSON_OBJECT('id', rs.id, 'cylinderId', rs.cylinder_id, 'kind', rs.kind, 'takenAt', rs.taken_at) ORDER BY rs.taken_at DESC, rs.id DESC)
    FROM reading_sets rs WHERE rs.job_id = ? AND rs.shop_id = ?) AS sets,
  (SELECT JSON_ARRAYAGG(JSON_OBJECT('readingSetId', r.reading_set_id, 'levelIndex', r.level_index, 'level', r.level, 'direction', r.direction,
      'diameterUm', r.diameter_um) ORDER BY r.level_index)
    FROM readings r JOIN reading_sets rp ON rp.id = r.reading_set_id WHERE rp.job_id = ? AND r.shop_id = ?) AS points,
  (SELECT JSON_ARRAYAGG(JSON_OBJECT('id', p.id, 'cylinderId', p.cylinder_id, 'label', p.label, 'diameterUm', p.diameter_um, 'sizingHeightUm', p.sizing_height_um)
      ORDER BY p.label, p.id)
    FROM pistons p WHERE p.job_id = ? AND p.shop_id = ?) AS pistons,
  (SELECT JSON_OBJECT('taperToleranceUm', st.taper_tolerance_um, 'outOfRoundToleranceUm', st.out_of_round_tolerance_um,
      'boringMarginUm', st.boring_margin_um, 'boringRzUm', st.boring_rz_um, 'asReceivedCleanupUm', st.as_received_cleanup_um, 'boreAboveStockUm', st.bore_above_stock_um)
    FROM shop_settings st WHERE st.shop_id = ?) AS settings,
  (SELECT JSON_OBJECT('id', m.id, 'name', m.name, 'spindleRpmMin', m.spindle_rpm_min, 'spindleRpmMax', m.spindle_rpm_max,
      'doubleStrokesPerMinMin', m.double_strokes_per_min_min, 'doubleStrokesPerMinMax', m.double_strokes_per_min_max, 'maxStrokeLengthUm', m.max_stroke_length_um,
      'drive', m.drive, 'pressureUnit', m.pressure_unit, 'pressureMin', m.pressure_min, 'pressureMax', m.pressure_max, 'headStoneLengthUm', m.head_stone_length_um,
      'active', m.active)
    FROM machines m WHERE m.id = ? AND m.shop_id = ?) AS machine,
  (SELECT JSON_ARRAYAGG(JSON_OBJECT('id', s.id, 'code', s.code, 'role', s.role, 'gritScale', s.grit_scale, 'gritNumber', s.grit_number,
      'stoneLengthUm', s.stone_length_um, 'currentHeightUm', s.current_height_um, 'wearLimitHeightUm', s.wear_limit_height_um, 'version', s.version,
      'rateId', rr.id, 'removalPerDoubleStrokeUm', rr.removal_per_double_stroke_um, 'referencePressure', rr.reference_pressure,
      'referencePressureUnit', rr.reference_pressure_unit, 'referenceBoreLengthUm', rr.reference_bore_length_um, 'raUm', rr.ra_um, 'rzUm', rr.rz_um,
      'cleanupMode', rr.cleanup_mode, 'cleanupStockUm', rr.cleanup_stock_um, 'cleanupRzMultiple', rr.cleanup_rz_multiple,
      'wearUmPerUmStock', rr.wear_um_per_um_stock, 'uncertaintyFraction', rr.uncertainty_fraction, 'source', rr.source, 'rateVersion', rr.version,
      'referenceAngleDeg', rr.reference_angle_deg, 'referenceDiameterUm', rr.reference_diameter_um, 'learnedState', lr.state)
      ORDER BY s.role, s.code)
    FROM stones s LEFT JOIN rate_rows rr ON rr.stone_id = s.id AND rr.shop_id = ?
      AND rr.bore_material = (SELECT jm.bore_material FROM jobs jm WHERE jm.id = ? AND jm.shop_id = ?)
    LEFT JOIN learned_rates lr ON lr.shop_id = s.shop_id AND lr.stone_id = s.id AND lr.bore_material = rr.bore_material
      AND lr.machine_id = ? AND lr.rate_version = rr.version
    WHERE s.shop_id = ? AND s.active = 1) AS stones`;

const paramsFor = (shopId: string, jobId: string, machineId: string) => [
  jobId, shopId, jobId, shopId, jobId, shopId, jobId, shopId, jobId, shopId, shopId, machineId, shopId, shopId, jobId, shopId, machineId, shopId,
];

/** The job fields a plan shows and rests on (getPlanningLibrary needs the bore material). */
export type JobRecord = Pick<Job, "id" | "number" | "engineDescription" | "boreMaterial" | "boreLengthUm" | "bottomClearanceUm" | "cylinderCount" | "standardBoreUm">;

type StoneFields = "id" | "code" | "role" | "gritScale" | "gritNumber" | "stoneLengthUm" | "currentHeightUm" | "wearLimitHeightUm" | "version";
type RateFields =
  | "removalPerDoubleStrokeUm" | "referencePressure" | "referencePressureUnit" | "referenceBoreLengthUm" | "raUm" | "rzUm" | "cleanupMode"
  | "cleanupStockUm" | "cleanupRzMultiple" | "wearUmPerUmStock" | "uncertaintyFraction" | "source" | "referenceAngleDeg" | "referenceDiameterUm";
/** One active stone with its rate row for the job's bore material (rate fields null where there is none). */
export type StoneRateRecord = Pick<Stone, StoneFields> & { rateId: string | null; rateVersion: number | null } & { [K in RateFields]: RateRow[K] | null }
  & { /** Learned on this machine against the rate row's current version (learned_rates), or null. */ learnedState: LearnedState | null };
export type MachineRecord = Pick<Machine, "id" | "name" | "spindleRpmMin" | "spindleRpmMax" | "doubleStrokesPerMinMin" | "doubleStrokesPerMinMax" | "maxStrokeLengthUm" | "drive" | "pressureMin" | "pressureMax" | "headStoneLengthUm" | "active"> & { pressureUnit: PressureUnit };

export type JobPlanningRecords = {
  job: JobRecord;
  cylinders: Array<{ id: string; number: number }>;
  sets: ReadingSetView[];
  pistons: PistonView[];
  tolerances: { taperUm: number; outOfRoundUm: number };
  /** The shop's settings the sizing story rests on (shop-settings/schema.ts). */
  sizing: Pick<ShopSettings, "boringMarginUm" | "boringRzUm" | "asReceivedCleanupUm" | "boreAboveStockUm">;
  machine: MachineRecord;
  stones: StoneRateRecord[];
};

type ShopSettingsJson = Pick<ShopSettings, "taperToleranceUm" | "outOfRoundToleranceUm" | "boringMarginUm" | "boringRzUm" | "asReceivedCleanupUm" | "boreAboveStockUm">;
type RawSet = Omit<ReadingSetView, "takenAt" | "levels"> & { takenAt: string; kind: ReadingKind };
type RawPoint = { readingSetId: string; levelIndex: number; level: string; direction: "A" | "B"; diameterUm: number };

function json<T>(value: unknown): T | null {
  if (value == null) return null;
  if (typeof value !== "string") return value as T;
  try {
    return JSON.parse(value) as T;
  } catch {
    // A cut document would plan on part of the job: refuse instead.
    throw new AppError("conflict", "This job's planning data is too large to plan in one go. Remove old reading sets first.");
  }
}
/** DATETIME(3) as MariaDB writes it in JSON ("2026-01-02 03:04:05.678", UTC) → Date. */
const utcDate = (text: string) => new Date(`${text.replace(" ", "T")}Z`);

/** The permissions reading a job's planning records needs (checked on cached records too). */
export function assertCanLoadPlanningRecords(actor: Actor): void {
  assertCan(actor, "jobs.view");
  assertCan(actor, "stones.view");
  assertCan(actor, "machines.view");
}

/**
 * Loads a job's planning records for the actor's shop: 404 for another shop's job or machine (job
 * first, as loadJob then getPlanningLibrary), 409 for a retired machine.
 */
export async function loadJobPlanningRecords({ actor, jobId, machineId, tx }: { actor: Actor; jobId: string; machineId: string; tx?: Tx }): Promise<JobPlanningRecords> {
  assertCanLoadPlanningRecords(actor);
  // Inside a transaction (a quick plan's save reads the job it just made); the preview reads through the pool.
  const params = paramsFor(actor.shopId, jobId, machineId);
  const rows = tx ? await executeRaw(tx, SQL, params) : (await pool.execute(SQL, params))[0];
  const row = (rows as Array<Record<string, unknown>>)[0] ?? {};
  const job = json<JobRecord & { boreMaterial: BoreMaterial }>(row.job);
  if (!job) throw notFound("That job");
  const machine = json<Omit<MachineRecord, "active"> & { active: number }>(row.machine);
  if (!machine) throw notFound("That machine");
  if (!machine.active) throw new AppError("conflict", `${machine.name} is retired; choose an active machine.`);
  const settings = json<ShopSettingsJson>(row.settings) ?? DEFAULT_SHOP_SETTINGS;
  const sets = (json<RawSet[]>(row.sets) ?? []).map((s) => ({ ...s, takenAt: utcDate(s.takenAt) }));
  return {
    job,
    cylinders: json(row.cylinders) ?? [],
    sets: toReadingSetViews(sets, json<RawPoint[]>(row.points) ?? []),
    pistons: json(row.pistons) ?? [],
    tolerances: { taperUm: settings.taperToleranceUm, outOfRoundUm: settings.outOfRoundToleranceUm },
    sizing: { boringMarginUm: settings.boringMarginUm, boringRzUm: settings.boringRzUm, asReceivedCleanupUm: settings.asReceivedCleanupUm, boreAboveStockUm: settings.boreAboveStockUm },
    machine: { ...machine, active: true },
    // The learned state is a JSON document stored as text: it arrives as a string inside the stones JSON.
    stones: (json<Array<Omit<StoneRateRecord, "learnedState"> & { learnedState: unknown }>>(row.stones) ?? []).map((s) => ({ ...s, learnedState: json<LearnedState>(s.learnedState) })),
  };
}
