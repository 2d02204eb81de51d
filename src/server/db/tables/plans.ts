import "server-only";
// Tables of the plans domain (issue 7): a plan for a job, and its stages per cylinder with the numbers
// computed when it was saved. Plans keep the inputs and the rate-row versions they used, so a saved
// plan shows the same numbers after the rate table changes (DESIGN.md §5, issue 7).
import { sql } from "drizzle-orm";
import { bigint, boolean, decimal, index, int, json, mysqlEnum, mysqlTable, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { BORE_MATERIAL_CODES } from "@/lib/bore-materials";
import { micrometres, timestamp } from "../columns";
import { jobs } from "./jobs";
import { BORE_BASES, PLAN_STATUSES, STAGE_KINDS } from "@/shared/plans/constants";

const shopId = () => varchar("shop_id", { length: 36 }).notNull();

/** One rate row (and its stone) as a plan used it: the versions decide "the table has changed since". */
export type PlanRateVersion = { stoneId: string; stoneVersion: number; rateRowId: string; rateRowVersion: number };

export const plans = mysqlTable(
  "plans",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    shopId: shopId(),
    jobId: varchar("job_id", { length: 36 })
      .notNull()
      .references(() => jobs.id, { onDelete: "cascade" }),
    status: mysqlEnum("status", PLAN_STATUSES).notNull().default("draft"),
    // One released plan per job: NULL for every other status, and a unique index over it [issue 7].
    releasedJobId: varchar("released_job_id", { length: 36 }).generatedAlwaysAs(sql`(case when \`status\` = 'released' then \`job_id\` end)`, {
      mode: "stored",
    }),
    machineId: varchar("machine_id", { length: 36 }).notNull(),
    boreMaterial: mysqlEnum("bore_material", BORE_MATERIAL_CODES).notNull(),
    /** The wizard's choices as validated by the preview/save schema. */
    inputs: json("inputs").notNull(),
    /** Per cylinder: sizing, geometry, stock, final check, issues (everything but the stages). */
    summary: json("summary").notNull(),
    rateVersions: json("rate_versions").$type<PlanRateVersion[]>().notNull(),
    canRelease: boolean("can_release").notNull().default(false),
    note: varchar("note", { length: 500 }).notNull().default(""),
    withdrawnReason: varchar("withdrawn_reason", { length: 500 }),
    createdBy: varchar("created_by", { length: 36 }).notNull(),
    createdAt: timestamp("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    releasedBy: varchar("released_by", { length: 36 }),
    releasedAt: timestamp("released_at"),
    withdrawnBy: varchar("withdrawn_by", { length: 36 }),
    withdrawnAt: timestamp("withdrawn_at"),
    updatedAt: timestamp("updated_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [
    index("plans_shop_job_idx").on(t.shopId, t.jobId),
    index("plans_shop_status_idx").on(t.shopId, t.status),
    uniqueIndex("plans_one_released_per_job").on(t.releasedJobId),
  ],
);

/** One stage of one cylinder, with the numbers the floor needs as columns and the whole stage as JSON. */
export const planStages = mysqlTable(
  "plan_stages",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    shopId: shopId(),
    planId: varchar("plan_id", { length: 36 })
      .notNull()
      .references(() => plans.id, { onDelete: "cascade" }),
    cylinderNumber: int("cylinder_number").notNull(),
    position: int("position").notNull(),
    kind: mysqlEnum("kind", STAGE_KINDS).notNull(),
    boreBasis: mysqlEnum("bore_basis", BORE_BASES).notNull(),
    stoneId: varchar("stone_id", { length: 36 }),
    rateRowId: varchar("rate_row_id", { length: 36 }),
    rateRowVersion: int("rate_row_version"),
    stockUm: micrometres("stock_um").notNull(),
    diameterBeforeUm: micrometres("diameter_before_um").notNull(),
    diameterAfterUm: micrometres("diameter_after_um").notNull(),
    strokesNominal: int("strokes_nominal"),
    strokesLow: int("strokes_low"),
    strokesHigh: int("strokes_high"),
    checkpointAfterStrokes: int("checkpoint_after_strokes"),
    pressure: decimal("pressure", { precision: 8, scale: 2, mode: "number" }),
    spindleRpm: decimal("spindle_rpm", { precision: 7, scale: 1, mode: "number" }),
    doubleStrokesPerMin: decimal("double_strokes_per_min", { precision: 6, scale: 1, mode: "number" }),
    strokeLengthUm: micrometres("stroke_length_um"),
    detail: json("detail").notNull(),
  },
  (t) => [
    index("plan_stages_shop_idx").on(t.shopId),
    uniqueIndex("plan_stages_plan_cyl_pos_unique").on(t.planId, t.cylinderNumber, t.position),
    index("plan_stages_stone_idx").on(t.shopId, t.stoneId),
  ],
);

export type Plan = typeof plans.$inferSelect;
export type PlanStageRow = typeof planStages.$inferSelect;

/**
 * One counter per shop, raised by database triggers (drizzle/0002_planning-version-triggers.sql) on
 * every write to a table the plan preview reads, so cached planning records are used only while their
 * shop's counter is unchanged. Rows are only ever raised, never deleted or lowered: a counter that went
 * back could match records cached before it.
 */
export const planningVersions = mysqlTable("planning_versions", {
  shopId: varchar("shop_id", { length: 36 }).primaryKey(),
  version: bigint("version", { mode: "number" }).notNull(),
});
