import "server-only";
import { index, mysqlEnum, mysqlTable, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { sql } from "drizzle-orm";
import { timestamp } from "../columns";
import { ROLES } from "@/shared/auth/roles";
import { UNIT_SYSTEMS } from "@/shared/units";
import { DEFAULT_TIME_ZONE, TIME_ZONE_MAX_LENGTH } from "@/shared/time";

const createdAt = () => timestamp("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`);

export const shops = mysqlTable("shops", {
  id: varchar("id", { length: 36 }).primaryKey(),
  name: varchar("name", { length: 120 }).notNull(),
  /** IANA name (src/shared/time.ts): every date and time the shop reads is shown in it. */
  timeZone: varchar("time_zone", { length: TIME_ZONE_MAX_LENGTH }).notNull().default(DEFAULT_TIME_ZONE),
  createdAt: createdAt(),
});

export const users = mysqlTable(
  "users",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    email: varchar("email", { length: 254 }).notNull(),
    name: varchar("name", { length: 120 }).notNull(),
    passwordHash: varchar("password_hash", { length: 255 }).notNull(),
    unitSystem: mysqlEnum("unit_system", UNIT_SYSTEMS).notNull().default("metric"),
    /** Set once the person opened a link mailed to the address; a shop mails outsiders only after that. */
    emailConfirmedAt: timestamp("email_confirmed_at"),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("users_email_unique").on(t.email)],
);

export const memberships = mysqlTable(
  "memberships",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    shopId: varchar("shop_id", { length: 36 })
      .notNull()
      .references(() => shops.id, { onDelete: "cascade" }),
    userId: varchar("user_id", { length: 36 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: mysqlEnum("role", ROLES).notNull(),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("memberships_shop_user_unique").on(t.shopId, t.userId), index("memberships_user_idx").on(t.userId)],
);

/** Marks one-off steps such as the demo seed, so `npm start` seeds an empty database only once. */
export const appMarkers = mysqlTable("app_markers", {
  name: varchar("name", { length: 64 }).primaryKey(),
  createdAt: createdAt(),
});

export type Shop = typeof shops.$inferSelect;
export type User = typeof users.$inferSelect;
export type NewUser = typeof users.$inferInsert;
export type Membership = typeof memberships.$inferSelect;
