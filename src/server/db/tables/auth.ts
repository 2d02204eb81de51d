import "server-only";
import { customType, index, int, json, mediumtext, mysqlEnum, mysqlTable, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { sql } from "drizzle-orm";
import { timestamp } from "../columns";
import { ROLES } from "@/shared/auth/roles";
import { shops, users } from "./core";

/**
 * A lowercase hex SHA-256 digest in a binary-collated column: tokens and their hashes compare
 * byte for byte, never case-insensitively (web-anchors A7, MariaDB caveat).
 */
const sha256Hex = customType<{ data: string; driverData: string }>({
  dataType: () => "char(64) CHARACTER SET ascii COLLATE ascii_bin",
});

const createdAt = () => timestamp("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`);

/** One row per signed-in browser. `id` is SHA-256(cookie token); the token itself is never stored. */
export const sessions = mysqlTable(
  "sessions",
  {
    id: sha256Hex("id").primaryKey(),
    userId: varchar("user_id", { length: 36 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    expiresAt: timestamp("expires_at").notNull(),
    signedInAt: timestamp("signed_in_at").notNull(),
    activeShopId: varchar("active_shop_id", { length: 36 }).references(() => shops.id, { onDelete: "set null" }),
    userAgent: varchar("user_agent", { length: 200 }).notNull().default(""),
  },
  (t) => [index("sessions_user_idx").on(t.userId)],
);

export const invitations = mysqlTable(
  "invitations",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    shopId: varchar("shop_id", { length: 36 })
      .notNull()
      .references(() => shops.id, { onDelete: "cascade" }),
    email: varchar("email", { length: 254 }).notNull(),
    role: mysqlEnum("role", ROLES).notNull(),
    tokenHash: sha256Hex("token_hash").notNull(),
    invitedByUserId: varchar("invited_by_user_id", { length: 36 }).references(() => users.id, { onDelete: "set null" }),
    expiresAt: timestamp("expires_at").notNull(),
    acceptedAt: timestamp("accepted_at"),
    revokedAt: timestamp("revoked_at"),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("invitations_token_unique").on(t.tokenHash), index("invitations_shop_idx").on(t.shopId)],
);

export const passwordResetTokens = mysqlTable(
  "password_reset_tokens",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    userId: varchar("user_id", { length: 36 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    tokenHash: sha256Hex("token_hash").notNull(),
    expiresAt: timestamp("expires_at").notNull(),
    usedAt: timestamp("used_at"),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("password_reset_token_unique").on(t.tokenHash), index("password_reset_user_idx").on(t.userId)],
);

/** A link that confirms a new owner's e-mail address (single use, stored hashed). */
export const emailConfirmations = mysqlTable(
  "email_confirmations",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    userId: varchar("user_id", { length: 36 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    tokenHash: sha256Hex("token_hash").notNull(),
    expiresAt: timestamp("expires_at").notNull(),
    usedAt: timestamp("used_at"),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("email_confirmations_token_unique").on(t.tokenHash), index("email_confirmations_user_idx").on(t.userId)],
);

export type OutboxAttachment = { filename: string; contentType: string; shopId: string; storedName: string };

export const OUTBOX_STATUSES = ["pending", "sent", "failed"] as const;

/** Mail waits here until it is handed to SMTP; bodies are cleared once sent (they may hold links). */
export const emailOutbox = mysqlTable(
  "email_outbox",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    shopId: varchar("shop_id", { length: 36 }),
    kind: varchar("kind", { length: 40 }).notNull(),
    toAddress: varchar("to_address", { length: 254 }).notNull(),
    subject: varchar("subject", { length: 200 }).notNull(),
    html: mediumtext("html").notNull(),
    text: mediumtext("text").notNull(),
    /** Files sent with the mail, read from the shop's stored uploads at send time (never copied here). */
    attachments: json("attachments").$type<OutboxAttachment[]>(),
    status: mysqlEnum("status", OUTBOX_STATUSES).notNull().default("pending"),
    attempts: int("attempts").notNull().default(0),
    nextAttemptAt: timestamp("next_attempt_at").notNull(),
    lockedUntil: timestamp("locked_until"),
    lastError: varchar("last_error", { length: 500 }),
    sentAt: timestamp("sent_at"),
    createdAt: createdAt(),
  },
  (t) => [index("email_outbox_due_idx").on(t.status, t.nextAttemptAt), index("email_outbox_shop_idx").on(t.shopId)],
);

/** Counters for abuse limits (sign-in, reset requests), one row per key and fixed window. */
export const rateLimitBuckets = mysqlTable("rate_limit_buckets", {
  key: varchar("bucket_key", { length: 191 }).primaryKey(),
  windowStartedAt: timestamp("window_started_at").notNull(),
  hits: int("hits").notNull().default(0),
  lastHitAt: timestamp("last_hit_at").notNull(),
});

export type SessionRow = typeof sessions.$inferSelect;
export type Invitation = typeof invitations.$inferSelect;
export type PasswordResetToken = typeof passwordResetTokens.$inferSelect;
export type OutboxRow = typeof emailOutbox.$inferSelect;
export type RateLimitBucket = typeof rateLimitBuckets.$inferSelect;
