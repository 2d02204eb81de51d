// Matrix rows for issue 13 (learning): Adopt writes a machine's learned rate into the rate row; lead and
// owner only ("rates.adopt"). Each call logs a run first, so there is something learned to adopt.
import { eq } from "drizzle-orm";
import { adoptLearnedAction } from "@/app/(shop)/stones/actions";
import { db } from "@/server/db";
import { rateRows } from "@/server/db/schema";
import type { MatrixCase, Outcome } from "../matrix";
import { actionOutcome } from "../matrix";
import { callAction } from "../session";
import { logCoarseStage } from "../../integration/learning-fixtures";

export const learningMatrixCases: MatrixCase[] = [
  {
    name: "action stones.adoptLearned",
    allowed: ["owner", "lead"],
    otherShop: 404,
    call: async ({ shop }) => {
      const { planShop } = await logCoarseStage(shop, 1.2);
      const rateRowId = planShop.rateRowIds.coarse;
      const [row] = await db.select({ version: rateRows.version }).from(rateRows).where(eq(rateRows.id, rateRowId));
      return actionOutcome(await callAction(adoptLearnedAction, { rateRowId, machineId: planShop.machineId, expectedVersion: row!.version, reason: "Matrix: runs agree" })) as Outcome;
    },
  },
];
