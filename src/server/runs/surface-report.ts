import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import type { db, Tx } from "@/server/db";
import { attachments } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { AppError } from "@/server/errors";
import { admitUpload } from "@/server/uploads/gate";
import { storeAttachment, type UploadFile } from "@/server/uploads/mutations";
import { SURFACE_REPORT_KINDS } from "@/shared/floor/constants";
import { assertMayLog, loadFloorCylinder, type LoadedCylinder } from "./load";

// A profilometer's surface-finish report, uploaded from the final card through the uploads machinery
// (same name, size, type and content checks, same quota and rate) as an attachment on the cylinder,
// then named by the final check that it backs. Whoever may log on the cylinder may attach it.

/** Role, assignment, quota and rate, before a byte of the body is read. */
export async function admitSurfaceReport({ actor, planId, cylinder }: { actor: Actor; planId: string; cylinder: number }): Promise<LoadedCylinder> {
  assertCan(actor, "runs.log");
  const loaded = await loadFloorCylinder({ actor, planId, cylinder });
  assertMayLog(actor, loaded.job, loaded.cylinderRow);
  await admitUpload({ actor, jobId: loaded.job.id, permission: "runs.log", keepsFile: true });
  return loaded;
}

export async function uploadSurfaceReport({ actor, loaded, file, clientId }: { actor: Actor; loaded: LoadedCylinder; file: UploadFile; clientId?: string }) {
  return storeAttachment({ actor, jobId: loaded.job.id, cylinderId: loaded.cylinderRow.id, file, clientId, kinds: SURFACE_REPORT_KINDS });
}

/** The report a final check names must be this cylinder's own, of a report kind; anything else is refused. */
export async function assertSurfaceReport(tx: Tx | typeof db, loaded: LoadedCylinder, reportId: string): Promise<void> {
  const [row] = await tx.select({ id: attachments.id }).from(attachments)
    .where(and(eq(attachments.id, reportId), eq(attachments.shopId, loaded.plan.shopId), eq(attachments.jobId, loaded.job.id), eq(attachments.cylinderId, loaded.cylinderRow.id), inArray(attachments.kind, [...SURFACE_REPORT_KINDS])))
    .limit(1);
  if (!row) throw new AppError("bad_request", "That surface report is not on this cylinder; attach it again.", { fieldErrors: { surfaceReportId: ["Attach the report again."] } });
}
