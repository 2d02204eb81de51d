import "server-only";
import { inTransaction } from "@/server/db/retry";
import { boreGeometry } from "@/lib/honing";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { AppError, isDuplicateKey } from "@/server/errors";
import { and, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { readingSets } from "@/server/db/schema";
import { clientIdOrNew } from "@/server/http/client-id";
import { loadJob } from "@/server/jobs/access";
import { listCylinders, getUnitSystem } from "@/server/jobs/queries";
import { getShopSettings } from "@/server/shop-settings/queries";
import { checkFileName, decodeText } from "@/server/uploads/check";
import { parseGaugeCsv, type CsvProblem } from "./csv";
import { GAUGE_CSV_MAX_BYTES } from "@/shared/uploads/file-rules";
import { insertReadingSets } from "./mutations";
import { lockPlanningVersion } from "@/server/plans/planning-version";
import { importOptionsSchema } from "@/shared/readings/schema";

export type ImportPreview = {
  ok: boolean;
  written: boolean;
  problems: CsvProblem[];
  sets: Array<{ cylinder: number; levels: Array<{ name: string; aUm: number; bUm: number }>; taperUm: number; outOfRoundUm: number }>;
};

function refuse(message: string): never {
  throw new AppError("bad_request", message, { fieldErrors: { file: [message] } });
}

/** The file must be a .csv of plain UTF-8 text under the size limit, or nothing is read. */
export function readCsvFile(file: { name: string; bytes: Uint8Array }): string {
  const { ext } = checkFileName(file.name);
  if (file.bytes.byteLength > GAUGE_CSV_MAX_BYTES) refuse(`The file is larger than ${GAUGE_CSV_MAX_BYTES / 1024} KB; a gauge CSV for one block is a few KB.`);
  if (ext !== "csv") refuse(`Only .csv files can be imported as readings (this one is .${ext || "?"}).`);
  const text = decodeText(file.bytes);
  if (text === null) refuse("The file is not plain text, so it is not a CSV file.");
  return text;
}

/** Previews a gauge CSV, or writes every reading set in it in one transaction; any bad row writes nothing. */
export async function importReadingsCsv({ actor, jobId, file, options }: { actor: Actor; jobId: string; file: { name: string; bytes: Uint8Array }; options: unknown }): Promise<ImportPreview> {
  assertCan(actor, "readings.edit");
  const { kind, gauge, mode } = importOptionsSchema.parse(options);
  const job = await loadJob({ actor, jobId });
  const text = readCsvFile(file);
  const [settings, unitSystem, cylinders] = await Promise.all([
    getShopSettings({ shopId: actor.shopId }),
    getUnitSystem({ userId: actor.userId }),
    listCylinders({ shopId: actor.shopId, jobId }),
  ]);
  const parsed = parseGaugeCsv(text, { cylinderCount: job.cylinderCount, levels: settings.readingLevels, defaultUnit: unitSystem === "inch" ? "in" : "mm", standardBoreUm: job.standardBoreUm });
  if (!parsed.ok) return { ok: false, written: false, problems: parsed.problems, sets: [] };
  const sets = parsed.sets.map((s) => {
    const g = boreGeometry({ levels: s.levels });
    return { ...s, taperUm: g.taperUm, outOfRoundUm: g.outOfRoundUm };
  });
  if (mode === "preview") return { ok: true, written: false, problems: [], sets };
  const idByNumber = new Map(cylinders.map((c) => [c.number, c.id]));
  // The device's id for this commit keys every set it writes, so a retried commit writes nothing twice.
  const rawId = (options as { clientId?: unknown } | null)?.clientId;
  const commitKey = rawId ? clientIdOrNew(rawId).replaceAll("-", "") : null;
  const keyOf = (i: number) => (commitKey ? `${commitKey}-${i}` : undefined);
  const alreadyWritten = async () => commitKey !== null && (await db.select({ id: readingSets.id }).from(readingSets).where(and(eq(readingSets.shopId, actor.shopId), eq(readingSets.clientKey, keyOf(0)!))).limit(1)).length > 0;
  if (await alreadyWritten()) return { ok: true, written: true, problems: [], sets };
  try {
    await inTransaction(async (tx) => {
      await lockPlanningVersion(tx, actor.shopId);
      const locked = await loadJob({ actor, jobId, tx, forUpdate: true });
      await insertReadingSets(tx, actor, locked, parsed.sets.map((s, i) => ({ cylinderId: idByNumber.get(s.cylinder)!, kind, gauge, source: "csv" as const, clientKey: keyOf(i), levels: s.levels })));
    });
  } catch (error) {
    if (!(isDuplicateKey(error) && (await alreadyWritten()))) throw error;
  }
  return { ok: true, written: true, problems: [], sets };
}
