import "server-only";
import { eq, sql } from "drizzle-orm";
import { env } from "@/env";
import { db } from "@/server/db";
import { attachments } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor, Permission } from "@/shared/auth/policy";
import { takeAttempt, type Limit } from "@/server/auth/rate-limit";
import { AppError } from "@/server/errors";
import { loadJob } from "@/server/jobs/access";
import { describeBytes } from "@/server/http/body";

// A busy shop photographs each bore a few times a day; 120 files an hour per shop is far above that
// (common practice: limit expensive writes per tenant, web-anchors A3/A4 ASVS 5.0 V5.2.4).
export const UPLOADS_PER_SHOP: Limit = { name: "upload:shop", max: 120, windowMs: 60 * 60 * 1000 };

/** Bytes a shop already keeps in attachments. */
export async function storedBytes(shopId: string): Promise<number> {
  const [row] = await db.select({ total: sql<string | number | null>`SUM(${attachments.sizeBytes})` }).from(attachments).where(eq(attachments.shopId, shopId));
  return Number(row?.total ?? 0);
}

/**
 * Everything an upload is refused for that needs no body: role, the job (of this shop), the shop's
 * storage quota and its upload rate. Runs before a single byte of the body is read.
 */
export async function admitUpload({ actor, jobId, permission, keepsFile = permission === "attachments.upload" }: { actor: Actor; jobId: string; permission: Permission; keepsFile?: boolean }) {
  assertCan(actor, permission);
  const job = await loadJob({ actor, jobId });
  if (keepsFile) {
    const used = await storedBytes(actor.shopId);
    if (used >= env.UPLOAD_SHOP_QUOTA_BYTES) {
      throw new AppError("too_large", `This shop's file storage is full (${describeBytes(env.UPLOAD_SHOP_QUOTA_BYTES)}). Remove old attachments first. Nothing was saved.`);
    }
  }
  await takeAttempt([[UPLOADS_PER_SHOP, actor.shopId]], "Too many files sent from this shop in the last hour.");
  return job;
}

/** The quota checked again with the real size, once the file is known. */
export async function assertQuotaFor(shopId: string, bytes: number): Promise<void> {
  if ((await storedBytes(shopId)) + bytes > env.UPLOAD_SHOP_QUOTA_BYTES) {
    throw new AppError("too_large", `This file would take the shop past its ${describeBytes(env.UPLOAD_SHOP_QUOTA_BYTES)} of file storage. Remove old attachments first. Nothing was saved.`);
  }
}
