import "server-only";
import { readStored } from "@/server/uploads/storage";
import { logError } from "@/server/log";
import { recordSettingsFor } from "./source";

/** The shop's logo bytes for the PDF, or null (none set, or the file is gone: the record goes without). */
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
