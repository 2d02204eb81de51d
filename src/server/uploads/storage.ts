import "server-only";
import { mkdir, open, readFile, rename, rm } from "node:fs/promises";
import path from "node:path";
import { randomUUID } from "node:crypto";
import sharp from "sharp";
import { env } from "@/env";
import { AppError } from "@/server/errors";

// Files live outside public/ under names the server makes; user file names never reach a path.
const root = () => path.resolve(env.UPLOAD_DIR);
const SAFE_NAME = /^[0-9a-f-]{36}(\.thumb)?\.(jpg|png|pdf|csv|webp)$/;

function pathOf(shopId: string, storedName: string): string {
  if (!SAFE_NAME.test(storedName) || !/^[0-9a-f-]{36}$/i.test(shopId)) throw new AppError("not_found", "That file was not found.");
  return path.join(root(), shopId, storedName);
}

/** Writes atomically: a temporary file, fsync, then rename, so a crash never leaves half a file. */
export async function writeStored(shopId: string, storedName: string, bytes: Uint8Array): Promise<void> {
  const target = pathOf(shopId, storedName);
  await mkdir(path.dirname(target), { recursive: true, mode: 0o700 });
  const temp = `${target}.${randomUUID()}.part`;
  const handle = await open(temp, "wx", 0o600);
  try {
    await handle.writeFile(bytes);
    await handle.sync();
  } finally {
    await handle.close();
  }
  await rename(temp, target);
}

export async function readStored(shopId: string, storedName: string): Promise<Buffer> {
  try {
    return await readFile(pathOf(shopId, storedName));
  } catch {
    throw new AppError("not_found", "That file was not found.");
  }
}

export async function removeStored(shopId: string, storedName: string): Promise<void> {
  await rm(pathOf(shopId, storedName), { force: true });
}

const MAX_PIXELS = 60_000_000;

/** Re-encodes a photo (drops metadata and anything hidden after the image data) and makes a thumbnail. */
export async function reencodeImage(bytes: Uint8Array, ext: "jpg" | "jpeg" | "png") {
  try {
    const image = sharp(bytes, { limitInputPixels: MAX_PIXELS, failOn: "error" }).rotate();
    const clean = ext === "png" ? await image.png({ compressionLevel: 8 }).toBuffer() : await image.jpeg({ quality: 88, mozjpeg: true }).toBuffer();
    const thumbnail = await sharp(clean).resize({ width: 360, height: 270, fit: "inside", withoutEnlargement: true }).webp({ quality: 75 }).toBuffer();
    return { clean, thumbnail };
  } catch {
    throw new AppError("bad_request", "The image could not be read; it may be damaged. Nothing was saved.", { fieldErrors: { file: ["The image could not be read."] } });
  }
}
