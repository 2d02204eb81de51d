// Tables of the floor (issue 12): each block of strokes run at the machine, and each final inspection.
// Their ids are made on the device (src/shared/client-id.ts), so a retried submission hits the primary
// key and is answered from the stored row: written once (DESIGN.md §8). The plan preview reads neither.
import { sql } from "drizzle-orm";
import { decimal, index, int, json, mysqlEnum, mysqlTable, varchar } from "drizzle-orm/mysql-core";
import { micrometres, timestamp } from "../columns";
import { plans } from "./plans";
import type { RunLearning } from "@/shared/learning/types";
import { RUN_BLOCKS, RUN_OUTCOMES, VERDICT_STATUSES } from "@/shared/floor/constants";

const shopId = () => varchar("shop_id", { length: 36 }).notNull();
const temperature = (name: string) => decimal(name, { precision: 4, scale: 1, mode: "number" });

/** One block of strokes at the machine: a stage up to its checkpoint, the rest of it, or a dwell. */
export const runs = mysqlTable(
  "runs",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    shopId: shopId(),
    planId: varchar("plan_id", { length: 36 })
      .notNull()
      .references(() => plans.id, { onDelete: "cascade" }),
    planStageId: varchar("plan_stage_id", { length: 36 }).notNull(),
    jobId: varchar("job_id", { length: 36 }).notNull(),
    cylinderId: varchar("cylinder_id", { length: 36 }).notNull(),
    cylinderNumber: int("cylinder_number").notNull(),
    stagePosition: int("stage_position").notNull(),
    block: mysqlEnum("block", RUN_BLOCKS).notNull(),
    outcome: mysqlEnum("outcome", RUN_OUTCOMES).notNull(),
    stoneId: varchar("stone_id", { length: 36 }),
    machineId: varchar("machine_id", { length: 36 }).notNull(),
    pressure: decimal("pressure", { precision: 8, scale: 2, mode: "number" }),
    spindleRpm: decimal("spindle_rpm", { precision: 7, scale: 1, mode: "number" }),
    doubleStrokesPerMin: decimal("double_strokes_per_min", { precision: 6, scale: 1, mode: "number" }),
    strokesDone: int("strokes_done").notNull(),
    /** Readings as typed, and corrected to 20 °C, from the deck down; null when none was taken. */
    readingsRaw: json("readings_raw"),
    readingsAfter: json("readings_after"),
    readingsBefore: json("readings_before"),
    blockTemperatureC: temperature("block_temperature_c"),
    gaugeTemperatureC: temperature("gauge_temperature_c"),
    /** What the card told the apprentice after the reading (strokes still to run, dwell, stop). */
    reestimate: json("reestimate"),
    /**
     * What the block says about its stone's rate, worked out when it is logged and never again, so the
     * live update and a rebuild read the same numbers (src/server/learning/observation.ts); null when
     * the block cannot say (a dwell, no reading before or after it, nothing removed).
     */
    learning: json("learning").$type<RunLearning>(),
    stoneWearUm: micrometres("stone_wear_um").notNull(),
    notes: varchar("notes", { length: 1000 }).notNull().default(""),
    loggedBy: varchar("logged_by", { length: 36 }).notNull(),
    /** When the apprentice finished the block on the device (may be before the upload, offline). */
    doneAt: timestamp("done_at").notNull(),
    createdAt: timestamp("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [
    index("runs_shop_plan_cyl_idx").on(t.shopId, t.planId, t.cylinderNumber, t.stagePosition),
    // The run log (/runs): newest first within the shop, or within one stone, machine or person.
    index("runs_shop_stone_idx").on(t.shopId, t.stoneId, t.doneAt),
    index("runs_shop_done_idx").on(t.shopId, t.doneAt),
    index("runs_shop_machine_done_idx").on(t.shopId, t.machineId, t.doneAt),
    index("runs_shop_person_done_idx").on(t.shopId, t.loggedBy, t.doneAt),
  ],
);

/** The final reading set of a cylinder and its verdict; the latest per cylinder counts. */
export const finalInspections = mysqlTable(
  "final_inspections",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    shopId: shopId(),
    planId: varchar("plan_id", { length: 36 })
      .notNull()
      .references(() => plans.id, { onDelete: "cascade" }),
    jobId: varchar("job_id", { length: 36 }).notNull(),
    cylinderId: varchar("cylinder_id", { length: 36 }).notNull(),
    cylinderNumber: int("cylinder_number").notNull(),
    readingsRaw: json("readings_raw").notNull(),
    readings: json("readings").notNull(),
    blockTemperatureC: temperature("block_temperature_c"),
    gaugeTemperatureC: temperature("gauge_temperature_c"),
    surface: json("surface"),
    /** The profilometer report (an attachment on the cylinder) the surface figures come from. */
    surfaceReportId: varchar("surface_report_id", { length: 36 }),
    status: mysqlEnum("status", VERDICT_STATUSES).notNull(),
    verdict: json("verdict").notNull(),
    inspectedBy: varchar("inspected_by", { length: 36 }).notNull(),
    inspectedAt: timestamp("inspected_at").notNull(),
    createdAt: timestamp("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("final_inspections_shop_plan_cyl_idx").on(t.shopId, t.planId, t.cylinderNumber, t.createdAt)],
);

export type RunRow = typeof runs.$inferSelect;
export type FinalInspectionRow = typeof finalInspections.$inferSelect;
