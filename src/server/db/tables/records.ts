import "server-only";
// Tables of the machining record (issue 14): the shop's record settings, every record as it was sent
// (its data and its PDF), and the customer's links. A link's token is stored only as its SHA-256.
import { sql } from "drizzle-orm";
import { customType, index, int, json, mysqlEnum, mysqlTable, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { timestamp } from "../columns";
import { jobs } from "./jobs";
import { UNIT_SYSTEMS } from "@/shared/units";

const shopId = () => varchar("shop_id", { length: 36 }).notNull();
/** Token hashes compare byte for byte, never case-insensitively (web-anchors A7, MariaDB caveat). */
const sha256Hex = customType<{ data: string; driverData: string }>({ dataType: () => "char(64) CHARACTER SET ascii COLLATE ascii_bin" });

/** One row per shop; a missing row means the defaults in src/shared/records/constants.ts. */
export const recordSettings = mysqlTable("record_settings", {
  shopId: varchar("shop_id", { length: 36 }).primaryKey(),
  address: varchar("address", { length: 400 }).notNull().default(""),
  contact: varchar("contact", { length: 200 }).notNull().default(""),
  remarks: varchar("remarks", { length: 2000 }).notNull(),
  /** A stored upload (src/server/uploads/storage.ts) under the shop's folder, PNG or JPEG. */
  logoStoredName: varchar("logo_stored_name", { length: 80 }),
  updatedAt: timestamp("updated_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
});

/** A record as sent: never changed afterwards; a correction is the next version. */
export const recordVersions = mysqlTable(
  "record_versions",
  {
    /** Made on the device, so a retried send hits the primary key and is answered once. */
    id: varchar("id", { length: 36 }).primaryKey(),
    shopId: shopId(),
    jobId: varchar("job_id", { length: 36 })
      .notNull()
      .references(() => jobs.id, { onDelete: "cascade" }),
    version: int("version").notNull(),
    unitSystem: mysqlEnum("unit_system", UNIT_SYSTEMS).notNull(),
    /** The RecordView exactly as the customer got it. */
    data: json("data").notNull(),
    pdfStoredName: varchar("pdf_stored_name", { length: 80 }).notNull(),
    pdfBytes: int("pdf_bytes").notNull(),
    sentTo: varchar("sent_to", { length: 254 }).notNull(),
    sentBy: varchar("sent_by", { length: 36 }).notNull(),
    sentAt: timestamp("sent_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [uniqueIndex("record_versions_job_version_unique").on(t.jobId, t.version), index("record_versions_shop_job_idx").on(t.shopId, t.jobId)],
);

/** The customer's read-only link to a job's latest record; expiring and revocable. */
export const recordLinks = mysqlTable(
  "record_links",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    shopId: shopId(),
    jobId: varchar("job_id", { length: 36 })
      .notNull()
      .references(() => jobs.id, { onDelete: "cascade" }),
    /** The version whose mail carried this link. */
    versionId: varchar("version_id", { length: 36 })
      .notNull()
      .references(() => recordVersions.id, { onDelete: "cascade" }),
    tokenHash: sha256Hex("token_hash").notNull(),
    expiresAt: timestamp("expires_at").notNull(),
    revokedAt: timestamp("revoked_at"),
    revokedBy: varchar("revoked_by", { length: 36 }),
    createdAt: timestamp("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [uniqueIndex("record_links_token_unique").on(t.tokenHash), index("record_links_shop_job_idx").on(t.shopId, t.jobId)],
);

export type RecordSettingsRow = typeof recordSettings.$inferSelect;
export type RecordVersionRow = typeof recordVersions.$inferSelect;
export type RecordLinkRow = typeof recordLinks.$inferSelect;
