import "server-only";
// Learned rates (issue 13): what the shop's own runs say about a stone's rate on one bore material and
// one machine, as the estimator's state (src/lib/honing/learning.ts). The state moves on by one run in
// the same transaction that logs the run (src/server/learning/update.ts), against the rate row version
// it was learned for: a new rate row version (an edit, an Adopt) starts learning again. The run log
// holds every observation (runs.learning), so `npm run learning:rebuild` can always replay it.
import { sql } from "drizzle-orm";
import { int, json, mysqlEnum, mysqlTable, primaryKey, varchar } from "drizzle-orm/mysql-core";
import { BORE_MATERIAL_CODES } from "@/lib/bore-materials";
import type { LearnedState } from "@/lib/honing";
import { timestamp } from "../columns";
import { shops } from "./core";
import { machines, stones } from "./stones";

export const learnedRates = mysqlTable(
  "learned_rates",
  {
    shopId: varchar("shop_id", { length: 36 })
      .notNull()
      .references(() => shops.id, { onDelete: "cascade" }),
    stoneId: varchar("stone_id", { length: 36 })
      .notNull()
      .references(() => stones.id, { onDelete: "cascade" }),
    boreMaterial: mysqlEnum("bore_material", BORE_MATERIAL_CODES).notNull(),
    machineId: varchar("machine_id", { length: 36 })
      .notNull()
      .references(() => machines.id, { onDelete: "cascade" }),
    /** The rate row version the state is learned against; another version means no learning yet. */
    rateVersion: int("rate_version").notNull(),
    /** Observations seen under this key (every rate version): the replay order of the run log. */
    sequence: int("sequence").notNull().default(0),
    /** The estimator's whole state as JSON: doubles round-trip exactly, so a rebuild compares equal. */
    state: json("state").$type<LearnedState>().notNull(),
    updatedAt: timestamp("updated_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [primaryKey({ name: "learned_rates_pk", columns: [t.shopId, t.stoneId, t.boreMaterial, t.machineId] })],
);

export type LearnedRateRow = typeof learnedRates.$inferSelect;
