import "server-only";
import { and, eq } from "drizzle-orm";
import { inTransaction } from "@/server/db/retry";
import { learnedRates, machines } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { AppError, notFound } from "@/server/errors";
import { assertVersion } from "@/server/stones/mutations";
import { lockRateRow, writeRateChange } from "@/server/stones/rate-mutations";
import { adoptLearnedSchema } from "@/shared/learning/schema";
import { keyWhere } from "./store";
import { learnedView } from "./view";

// Adopt (lead and owner): one machine's learned rate becomes the rate row's next version, through the
// stone library's own versioned path with the lead's reason. Learning restarts by itself: the learned
// states were learned against the old version, and every reader takes only the row's current version.

/** The rate column keeps 0.001 µm (rate_rows.removal_per_double_stroke_um, DECIMAL(9,3)). */
const toColumn = (um: number) => Math.round(um * 1000) / 1000;

export async function adoptLearnedRate({ actor, input }: { actor: Actor; input: unknown }) {
  assertCan(actor, "rates.adopt");
  const { rateRowId, machineId, expectedVersion, reason } = adoptLearnedSchema.parse(input);
  return inTransaction(async (tx) => {
    const before = await lockRateRow(tx, actor, rateRowId);
    assertVersion(before.version, expectedVersion);
    const [machine] = await tx.select({ name: machines.name }).from(machines).where(and(eq(machines.id, machineId), eq(machines.shopId, actor.shopId)));
    if (!machine) throw notFound("That machine");
    const [row] = await tx.select().from(learnedRates)
      .where(keyWhere({ shopId: actor.shopId, stoneId: before.stoneId, boreMaterial: before.boreMaterial, machineId })).for("update");
    const learned = row && row.rateVersion === before.version ? learnedView(row.state) : null;
    if (!learned || learned.runsUsed === 0) throw new AppError("conflict", "There are no runs on this rate row's version to adopt yet.");
    const removal = toColumn(before.removalPerDoubleStrokeUm * learned.multiplier);
    const why = `Adopted the rate learned from ${learned.runsUsed} run${learned.runsUsed === 1 ? "" : "s"} on ${machine.name} (×${learned.multiplier.toFixed(3)}): ${reason}`;
    const result = await writeRateChange(tx, actor, before, { removalPerDoubleStrokeUm: removal }, why);
    if (!result.changed) throw new AppError("conflict", "The learned rate rounds to the table's own figure: nothing to adopt.");
    return { ...result, removalPerDoubleStrokeUm: removal };
  });
}
