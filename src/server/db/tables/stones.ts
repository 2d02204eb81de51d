import "server-only";
// Tables of the stones domain (issue 6): the shop's honing stones, their rate table per bore material,
// the version history of both, and the shop's honing machines.
import { sql } from "drizzle-orm";
import { boolean, decimal, index, int, json, mysqlEnum, mysqlTable, text, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { BORE_MATERIAL_CODES } from "@/lib/bore-materials";
import { micrometres, timestamp } from "../columns";
import { shops, users } from "./core";
import {
  ABRASIVES,
  CHANGE_KINDS,
  CLEANUP_MODES,
  GRIT_SCALE_IDS,
  PRESSURE_UNITS,
  RATE_SOURCES,
  STONE_ROLES,
  STROKE_DRIVES,
} from "@/shared/stones/constants";

const shopId = () =>
  varchar("shop_id", { length: 36 })
    .notNull()
    .references(() => shops.id, { onDelete: "cascade" });
const createdAt = () => timestamp("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`);
// Removal rates and roughness are far below the 0.1 µm of micrometres(): same unit, finer scale.
const fineMicrometres = (name: string) => decimal(name, { precision: 9, scale: 3, mode: "number" });

export const machines = mysqlTable(
  "machines",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    shopId: shopId(),
    name: varchar("name", { length: 80 }).notNull(),
    spindleRpmMin: int("spindle_rpm_min").notNull(),
    spindleRpmMax: int("spindle_rpm_max").notNull(),
    doubleStrokesPerMinMin: decimal("double_strokes_per_min_min", { precision: 6, scale: 1, mode: "number" }).notNull(),
    doubleStrokesPerMinMax: decimal("double_strokes_per_min_max", { precision: 6, scale: 1, mode: "number" }).notNull(),
    maxStrokeLengthUm: micrometres("max_stroke_length_um").notNull(),
    drive: mysqlEnum("drive", STROKE_DRIVES).notNull(),
    pressureUnit: mysqlEnum("pressure_unit", PRESSURE_UNITS).notNull(),
    pressureMin: decimal("pressure_min", { precision: 8, scale: 2, mode: "number" }).notNull(),
    pressureMax: decimal("pressure_max", { precision: 8, scale: 2, mode: "number" }).notNull(),
    headStoneLengthUm: micrometres("head_stone_length_um").notNull(),
    notes: varchar("notes", { length: 500 }).notNull().default(""),
    active: boolean("active").notNull().default(true),
    isDemo: boolean("is_demo").notNull().default(false),
    createdAt: createdAt(),
    updatedAt: timestamp("updated_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("machines_shop_idx").on(t.shopId), uniqueIndex("machines_shop_name_unique").on(t.shopId, t.name)],
);

export const stones = mysqlTable(
  "stones",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    shopId: shopId(),
    code: varchar("code", { length: 40 }).notNull(),
    role: mysqlEnum("role", STONE_ROLES).notNull(),
    abrasive: mysqlEnum("abrasive", ABRASIVES).notNull(),
    gritScale: mysqlEnum("grit_scale", GRIT_SCALE_IDS).notNull(),
    gritNumber: int("grit_number").notNull(),
    bond: varchar("bond", { length: 60 }).notNull(),
    stoneLengthUm: micrometres("stone_length_um").notNull(),
    stoneWidthUm: micrometres("stone_width_um").notNull(),
    stonesPerHead: int("stones_per_head").notNull(),
    startHeightUm: micrometres("start_height_um").notNull(),
    wearLimitHeightUm: micrometres("wear_limit_height_um").notNull(),
    currentHeightUm: micrometres("current_height_um").notNull(),
    notes: varchar("notes", { length: 500 }).notNull().default(""),
    active: boolean("active").notNull().default(true),
    isDemo: boolean("is_demo").notNull().default(false),
    version: int("version").notNull().default(1),
    createdAt: createdAt(),
    updatedAt: timestamp("updated_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("stones_shop_idx").on(t.shopId), uniqueIndex("stones_shop_code_unique").on(t.shopId, t.code)],
);

export const rateRows = mysqlTable(
  "rate_rows",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    shopId: shopId(),
    stoneId: varchar("stone_id", { length: 36 })
      .notNull()
      .references(() => stones.id, { onDelete: "cascade" }),
    boreMaterial: mysqlEnum("bore_material", BORE_MATERIAL_CODES).notNull(),
    removalPerDoubleStrokeUm: fineMicrometres("removal_per_double_stroke_um").notNull(),
    referencePressure: decimal("reference_pressure", { precision: 8, scale: 2, mode: "number" }).notNull(),
    referencePressureUnit: mysqlEnum("reference_pressure_unit", PRESSURE_UNITS).notNull(),
    referenceBoreLengthUm: micrometres("reference_bore_length_um").notNull(),
    /** Included crosshatch the rate was measured at; rows from before the removal model were at the 45° default. */
    referenceAngleDeg: decimal("reference_angle_deg", { precision: 5, scale: 2, mode: "number" }).notNull().default(45),
    /** Bore the rate was measured in; null = the rate is not scaled with diameter. */
    referenceDiameterUm: micrometres("reference_diameter_um"),
    raUm: fineMicrometres("ra_um").notNull(),
    rzUm: fineMicrometres("rz_um").notNull(),
    rkUm: fineMicrometres("rk_um"),
    rpkUm: fineMicrometres("rpk_um"),
    rvkUm: fineMicrometres("rvk_um"),
    cleanupMode: mysqlEnum("cleanup_mode", CLEANUP_MODES).notNull(),
    cleanupStockUm: micrometres("cleanup_stock_um"),
    cleanupRzMultiple: decimal("cleanup_rz_multiple", { precision: 4, scale: 2, mode: "number" }),
    wearUmPerUmStock: decimal("wear_um_per_um_stock", { precision: 8, scale: 4, mode: "number" }).notNull(),
    uncertaintyFraction: decimal("uncertainty_fraction", { precision: 4, scale: 3, mode: "number" }).notNull(),
    source: mysqlEnum("source", RATE_SOURCES).notNull(),
    notes: varchar("notes", { length: 500 }).notNull().default(""),
    version: int("version").notNull().default(1),
    createdAt: createdAt(),
    updatedAt: timestamp("updated_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("rate_rows_shop_idx").on(t.shopId), uniqueIndex("rate_rows_stone_material_unique").on(t.stoneId, t.boreMaterial)],
);

// One history row per change: the values before and after, who, when and why (DESIGN.md §5.7, issue 6).
const versionColumns = () => ({
  id: varchar("id", { length: 36 }).primaryKey(),
  shopId: shopId(),
  version: int("version").notNull(),
  kind: mysqlEnum("kind", CHANGE_KINDS).notNull(),
  restoredFromVersion: int("restored_from_version"),
  oldValues: json("old_values"),
  newValues: json("new_values").notNull(),
  reason: text("reason").notNull(),
  changedBy: varchar("changed_by", { length: 36 }).references(() => users.id, { onDelete: "set null" }),
  changedAt: timestamp("changed_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
});

export const stoneVersions = mysqlTable(
  "stone_versions",
  {
    ...versionColumns(),
    stoneId: varchar("stone_id", { length: 36 })
      .notNull()
      .references(() => stones.id, { onDelete: "cascade" }),
  },
  (t) => [index("stone_versions_shop_idx").on(t.shopId), uniqueIndex("stone_versions_stone_version_unique").on(t.stoneId, t.version)],
);

export const rateRowVersions = mysqlTable(
  "rate_row_versions",
  {
    ...versionColumns(),
    rateRowId: varchar("rate_row_id", { length: 36 })
      .notNull()
      .references(() => rateRows.id, { onDelete: "cascade" }),
    stoneId: varchar("stone_id", { length: 36 }).notNull(),
  },
  (t) => [
    index("rate_row_versions_shop_idx").on(t.shopId),
    index("rate_row_versions_stone_idx").on(t.stoneId),
    uniqueIndex("rate_row_versions_row_version_unique").on(t.rateRowId, t.version),
  ],
);

export type Machine = typeof machines.$inferSelect;
export type Stone = typeof stones.$inferSelect;
export type RateRow = typeof rateRows.$inferSelect;
export type StoneVersion = typeof stoneVersions.$inferSelect;
export type RateRowVersion = typeof rateRowVersions.$inferSelect;
