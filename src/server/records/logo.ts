import "server-only";
import sharp from "sharp";
import { db } from "@/server/db";
import { recordSettings } from "@/server/db/schema";
import { newId } from "@/server/db/ids";
import { assertCan } from "@/server/auth/guard";
import { takeAttempt } from "@/server/auth/rate-limit";
import { AppError } from "@/server/errors";
import { logError } from "@/server/log";
import { checkUpload } from "@/server/uploads/check";
import { UPLOADS_PER_SHOP } from "@/server/uploads/gate";
import { readStored, removeStored, writeStored } from "@/server/uploads/storage";
import type { UploadFile } from "@/server/uploads/mutations";
import type { Actor } from "@/shared/auth/policy";
import { DEFAULT_RECORD_REMARKS } from "@/shared/records/constants";
import { LOGO_MAX_BYTES, LOGO_MAX_SIDE_PX, LOGO_STORED_SIDE_PX } from "@/shared/records/logo";
import { LOGO_EXTENSIONS, typesText } from "@/shared/uploads/file-rules";
import { recordSettingsFor } from "./source";

// The shop's logo on the machining record and the quote and invoice PDFs: one PNG or JPEG, checked by
// the uploads machinery (name, size, content sniffed), its pixel size bounded, re-encoded (metadata
// and anything after the image data dropped) and scaled down before it is kept.

const refuse = (message: string) => new AppError("bad_request", message, { fieldErrors: { file: [message] } });

/** The shop's logo bytes, or null (none set, or the file is gone: the document goes without). */
export async function readLogo(shopId: string): Promise<Buffer | null> {
  const { logoStoredName } = await recordSettingsFor(shopId);
  if (!logoStoredName) return null;
  try {
    return await readStored(shopId, logoStoredName);
  } catch (error) {
    logError("records.logo_unreadable", error);
    return null;
  }
}

/** The logo as an HTTP answer for an <img>, or a 404 when the shop has none. */
export async function logoResponse(shopId: string): Promise<Response> {
  const { logoStoredName } = await recordSettingsFor(shopId);
  const bytes = logoStoredName ? await readLogo(shopId) : null;
  if (!logoStoredName || !bytes) return new Response(null, { status: 404 });
  return new Response(new Uint8Array(bytes), {
    headers: {
      "content-type": logoStoredName.endsWith(".png") ? "image/png" : "image/jpeg",
      "content-length": String(bytes.byteLength),
      "x-content-type-options": "nosniff",
      "content-security-policy": "default-src 'none'; sandbox",
      "cache-control": "private, max-age=60",
    },
  });
}

async function cleanLogo(bytes: Uint8Array, png: boolean): Promise<Buffer> {
  let meta: Awaited<ReturnType<ReturnType<typeof sharp>["metadata"]>>;
  try {
    meta = await sharp(bytes, { failOn: "error" }).metadata();
  } catch {
    throw refuse("The picture could not be read; it may be damaged. Nothing was saved.");
  }
  if (!meta.width || !meta.height) throw refuse("The picture could not be read; it may be damaged. Nothing was saved.");
  if (meta.width > LOGO_MAX_SIDE_PX || meta.height > LOGO_MAX_SIDE_PX) {
    throw refuse(`The picture is ${meta.width} × ${meta.height} pixels; a logo may be at most ${LOGO_MAX_SIDE_PX} pixels on each side. Nothing was saved.`);
  }
  try {
    const image = sharp(bytes, { failOn: "error" }).rotate().resize({ width: LOGO_STORED_SIDE_PX, height: LOGO_STORED_SIDE_PX, fit: "inside", withoutEnlargement: true });
    return png ? await image.png({ compressionLevel: 8 }).toBuffer() : await image.jpeg({ quality: 90 }).toBuffer();
  } catch {
    throw refuse("The picture could not be read; it may be damaged. Nothing was saved.");
  }
}

async function keepLogoName(shopId: string, storedName: string | null): Promise<void> {
  await db.insert(recordSettings).values({ shopId, remarks: DEFAULT_RECORD_REMARKS, logoStoredName: storedName })
    .onDuplicateKeyUpdate({ set: { logoStoredName: storedName, updatedAt: new Date() } });
}

/** Sets or replaces the shop's logo (owner). The old file goes once the new one is in place. */
export async function setLogo({ actor, file }: { actor: Actor; file: UploadFile }): Promise<{ hasLogo: true }> {
  assertCan(actor, "shop.edit");
  await takeAttempt([[UPLOADS_PER_SHOP, actor.shopId]], "Too many files sent from this shop in the last hour.");
  const checked = await checkUpload({ ...file, maxBytes: LOGO_MAX_BYTES });
  if (!LOGO_EXTENSIONS.includes(checked.ext)) throw refuse(`A logo is a ${typesText(LOGO_EXTENSIONS)} picture.`);
  const png = checked.ext === "png";
  const clean = await cleanLogo(file.bytes, png);
  const storedName = `${newId()}.${png ? "png" : "jpg"}`;
  const before = (await recordSettingsFor(actor.shopId)).logoStoredName;
  await writeStored(actor.shopId, storedName, clean);
  try {
    await keepLogoName(actor.shopId, storedName);
  } catch (error) {
    await removeStored(actor.shopId, storedName).catch(() => undefined);
    throw error;
  }
  if (before) await removeStored(actor.shopId, before).catch((error: unknown) => logError("records.logo_remove_failed", error));
  return { hasLogo: true };
}

/** Removes the shop's logo (owner); removing when there is none changes nothing. */
export async function removeLogo({ actor }: { actor: Actor }): Promise<{ hasLogo: false }> {
  assertCan(actor, "shop.edit");
  const before = (await recordSettingsFor(actor.shopId)).logoStoredName;
  if (!before) return { hasLogo: false };
  await keepLogoName(actor.shopId, null);
  await removeStored(actor.shopId, before).catch((error: unknown) => logError("records.logo_remove_failed", error));
  return { hasLogo: false };
}
