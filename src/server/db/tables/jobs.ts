import "server-only";
// Tables of the jobs domain (issue 5): customers, jobs, cylinders, reading sets and readings, pistons,
// attachments, and the shop's intake settings. Every row carries shop_id and every query is scoped by it.
import { sql } from "drizzle-orm";
import {
  boolean,
  date,
  decimal,
  index,
  int,
  mysqlEnum,
  mysqlTable,
  text,
  uniqueIndex,
  varchar,
} from "drizzle-orm/mysql-core";
import { micrometres, timestamp } from "../columns";
import { BORE_MATERIAL_CODES } from "@/lib/bore-materials";
import { UNIT_SYSTEMS } from "@/shared/units";
import { ATTACHMENT_KINDS, DIRECTIONS, JOB_STATUSES, PISTON_TYPES, READING_KINDS } from "@/shared/jobs/constants";

export { ATTACHMENT_KINDS, DIRECTIONS, JOB_STATUSES, PISTON_TYPES, READING_KINDS };
export type { AttachmentKind, JobStatus, PistonType, ReadingKind } from "@/shared/jobs/constants";

const id = () => varchar("id", { length: 36 }).primaryKey();
const shopId = () => varchar("shop_id", { length: 36 }).notNull();
const createdAt = () => timestamp("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`);
const updatedAt = () => timestamp("updated_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`);

export const customers = mysqlTable(
  "customers",
  {
    id: id(),
    shopId: shopId(),
    name: varchar("name", { length: 120 }).notNull(),
    email: varchar("email", { length: 254 }),
    phone: varchar("phone", { length: 40 }),
    notes: varchar("notes", { length: 2000 }),
    /** The unit the customer reads their machining record in; null: the sender's own unit. */
    unitSystem: mysqlEnum("unit_system", UNIT_SYSTEMS),
    archivedAt: timestamp("archived_at"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("customers_shop_idx").on(t.shopId, t.name)],
);

/** One row per shop: the last job number handed out. Locked inside the job-creating transaction. */
export const jobNumberSequences = mysqlTable("job_number_sequences", {
  shopId: varchar("shop_id", { length: 36 }).primaryKey(),
  lastNumber: int("last_number").notNull().default(0),
});

export const jobs = mysqlTable(
  "jobs",
  {
    id: id(),
    shopId: shopId(),
    number: int("number").notNull(),
    customerId: varchar("customer_id", { length: 36 }),
    engineDescription: varchar("engine_description", { length: 200 }).notNull(),
    boreMaterial: mysqlEnum("bore_material", BORE_MATERIAL_CODES).notNull(),
    cylinderCount: int("cylinder_count").notNull(),
    standardBoreUm: micrometres("standard_bore_um").notNull(),
    boreLengthUm: micrometres("bore_length_um").notNull(),
    bottomClearanceUm: micrometres("bottom_clearance_um"),
    wallThicknessUm: micrometres("wall_thickness_um"),
    minWallUm: micrometres("min_wall_um"),
    torquePlate: boolean("torque_plate").notNull().default(false),
    dueDate: date("due_date", { mode: "string" }),
    notes: varchar("notes", { length: 4000 }),
    status: mysqlEnum("status", JOB_STATUSES).notNull().default("received"),
    assignedUserId: varchar("assigned_user_id", { length: 36 }),
    createdBy: varchar("created_by", { length: 36 }).notNull(),
    archivedAt: timestamp("archived_at"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex("jobs_shop_number_unique").on(t.shopId, t.number),
    index("jobs_shop_status_idx").on(t.shopId, t.status),
    index("jobs_shop_due_idx").on(t.shopId, t.dueDate),
    index("jobs_customer_idx").on(t.customerId),
  ],
);

export const cylinders = mysqlTable(
  "cylinders",
  {
    id: id(),
    shopId: shopId(),
    jobId: varchar("job_id", { length: 36 })
      .notNull()
      .references(() => jobs.id, { onDelete: "cascade" }),
    number: int("number").notNull(),
    assignedUserId: varchar("assigned_user_id", { length: 36 }),
    notes: varchar("notes", { length: 1000 }),
  },
  (t) => [uniqueIndex("cylinders_job_number_unique").on(t.jobId, t.number), index("cylinders_shop_idx").on(t.shopId)],
);

export const readingSets = mysqlTable(
  "reading_sets",
  {
    id: id(),
    shopId: shopId(),
    jobId: varchar("job_id", { length: 36 })
      .notNull()
      .references(() => jobs.id, { onDelete: "cascade" }),
    cylinderId: varchar("cylinder_id", { length: 36 })
      .notNull()
      .references(() => cylinders.id, { onDelete: "cascade" }),
    kind: mysqlEnum("kind", READING_KINDS).notNull(),
    gauge: varchar("gauge", { length: 80 }),
    temperatureC: decimal("temperature_c", { precision: 4, scale: 1, mode: "number" }),
    source: mysqlEnum("source", ["manual", "csv"]).notNull().default("manual"),
    /** Client-made key so a retried submission is written once (DESIGN.md §8). */
    clientKey: varchar("client_key", { length: 64 }),
    takenBy: varchar("taken_by", { length: 36 }).notNull(),
    takenAt: timestamp("taken_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [
    index("reading_sets_cylinder_idx").on(t.cylinderId, t.takenAt),
    index("reading_sets_shop_job_idx").on(t.shopId, t.jobId),
    uniqueIndex("reading_sets_client_key_unique").on(t.shopId, t.clientKey),
  ],
);

export const readings = mysqlTable(
  "readings",
  {
    id: id(),
    shopId: shopId(),
    readingSetId: varchar("reading_set_id", { length: 36 })
      .notNull()
      .references(() => readingSets.id, { onDelete: "cascade" }),
    levelIndex: int("level_index").notNull(),
    level: varchar("level", { length: 40 }).notNull(),
    direction: mysqlEnum("direction", DIRECTIONS).notNull(),
    diameterUm: micrometres("diameter_um").notNull(),
  },
  (t) => [uniqueIndex("readings_set_point_unique").on(t.readingSetId, t.levelIndex, t.direction), index("readings_shop_idx").on(t.shopId)],
);

export const pistons = mysqlTable(
  "pistons",
  {
    id: id(),
    shopId: shopId(),
    jobId: varchar("job_id", { length: 36 })
      .notNull()
      .references(() => jobs.id, { onDelete: "cascade" }),
    /** Null: one of a loose set, to be matched to a bore later. */
    cylinderId: varchar("cylinder_id", { length: 36 }),
    label: varchar("label", { length: 40 }).notNull(),
    diameterUm: micrometres("diameter_um").notNull(),
    sizingHeightUm: micrometres("sizing_height_um").notNull(),
    type: mysqlEnum("type", PISTON_TYPES).notNull(),
    clearanceMinUm: micrometres("clearance_min_um").notNull(),
    clearanceMaxUm: micrometres("clearance_max_um").notNull(),
    notes: varchar("notes", { length: 1000 }),
    createdAt: createdAt(),
  },
  (t) => [index("pistons_shop_job_idx").on(t.shopId, t.jobId)],
);

export const attachments = mysqlTable(
  "attachments",
  {
    id: id(),
    shopId: shopId(),
    jobId: varchar("job_id", { length: 36 })
      .notNull()
      .references(() => jobs.id, { onDelete: "cascade" }),
    cylinderId: varchar("cylinder_id", { length: 36 }),
    kind: mysqlEnum("kind", ATTACHMENT_KINDS).notNull(),
    /** The uploader's file name, cleaned, for display only; never part of a path. */
    displayName: varchar("display_name", { length: 120 }).notNull(),
    storedName: varchar("stored_name", { length: 80 }).notNull(),
    thumbnailName: varchar("thumbnail_name", { length: 80 }),
    contentType: varchar("content_type", { length: 60 }).notNull(),
    sizeBytes: int("size_bytes").notNull(),
    uploadedBy: varchar("uploaded_by", { length: 36 }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("attachments_shop_job_idx").on(t.shopId, t.jobId)],
);

/** The shop's intake settings; a missing row means the defaults in src/server/shop-settings. */
export const shopSettings = mysqlTable("shop_settings", {
  shopId: varchar("shop_id", { length: 36 }).primaryKey(),
  taperToleranceUm: micrometres("taper_tolerance_um").notNull(),
  outOfRoundToleranceUm: micrometres("out_of_round_tolerance_um").notNull(),
  /** Added to the stone sequence's clean-up stocks to give the bore-to allowance (DESIGN §5.1). */
  boringMarginUm: micrometres("boring_margin_um").notNull().default(10),
  /** Roughness the shop's finish boring cut leaves; its clean-up is owed by the first honing stage. */
  boringRzUm: micrometres("boring_rz_um").notNull().default(6),
  /** Stock a worn bore needs before its surface is all new metal, when the plan does not bore. */
  asReceivedCleanupUm: micrometres("as_received_cleanup_um").notNull().default(10),
  /** "Bore first" is on when a cylinder's honing stock is above this. */
  boreAboveStockUm: micrometres("bore_above_stock_um").notNull().default(100),
  /** JSON array of µm steps above standard, e.g. [0,250,500]. */
  oversizeStepsUm: text("oversize_steps_um").notNull(),
  /** JSON array of level names from the deck down, e.g. ["top","middle","bottom"]. */
  readingLevels: text("reading_levels").notNull(),
  /** Block minus gauge temperature past which a final verdict waits for the block to cool (K). */
  maxTemperatureDifferenceK: decimal("max_temperature_difference_k", { precision: 4, scale: 1, mode: "number" }).notNull().default(2),
  /** The gauge's usual temperature (the shop's), filled in on the floor's reading cards; null = typed each time. */
  gaugeTemperatureC: decimal("gauge_temperature_c", { precision: 4, scale: 1, mode: "number" }),
  updatedAt: updatedAt(),
});

export type Customer = typeof customers.$inferSelect;
export type Job = typeof jobs.$inferSelect;
export type Cylinder = typeof cylinders.$inferSelect;
export type ReadingSet = typeof readingSets.$inferSelect;
export type Reading = typeof readings.$inferSelect;
export type Piston = typeof pistons.$inferSelect;
export type Attachment = typeof attachments.$inferSelect;
export type ShopSettingsRow = typeof shopSettings.$inferSelect;
