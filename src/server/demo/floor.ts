import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { machines } from "@/server/db/schema";
import type { Actor } from "@/shared/auth/policy";
import { assignCylinder, createJob } from "@/server/jobs/mutations";
import { listCylinders } from "@/server/jobs/queries";
import { createPiston } from "@/server/pistons/mutations";
import { releasePlan, savePlanDraft } from "@/server/plans/mutations";
import { createReadingSet } from "@/server/readings/mutations";
import type { DemoContext } from "./seed";

// A released demo plan for the floor (issue 12): a small invented two-cylinder job, planned by the demo
// machinist, released by the demo lead, both cylinders assigned to the demo apprentice. Every figure
// is invented demo data.
const NOTE = "Demo data: invented for the Borewise floor demo.";
const THOU = 25.4;
/** As-received readings (µm), a little worn at the top (invented). */
const BORES = [
  [{ name: "top", aUm: 93_968, bUm: 93_964 }, { name: "middle", aUm: 93_963, bUm: 93_962 }, { name: "bottom", aUm: 93_960, bUm: 93_961 }],
  [{ name: "top", aUm: 93_970, bUm: 93_966 }, { name: "middle", aUm: 93_964, bUm: 93_963 }, { name: "bottom", aUm: 93_961, bUm: 93_961 }],
];

export async function seedDemoFloor(context: DemoContext): Promise<{ planId: string }> {
  const { shopId, userIdsByRole } = context;
  if (!shopId || !userIdsByRole.machinist || !userIdsByRole.lead || !userIdsByRole.apprentice) throw new Error("seedDemoFloor needs the demo shop and its people.");
  const machinist: Actor = { userId: userIdsByRole.machinist, shopId, role: "machinist" };
  const lead: Actor = { userId: userIdsByRole.lead, shopId, role: "lead" };
  const [machine] = await db.select({ id: machines.id }).from(machines).where(and(eq(machines.shopId, shopId), eq(machines.drive, "constant"))).limit(1);
  if (!machine) throw new Error("seedDemoFloor needs the demo machines (stones step first).");
  const { id: jobId } = await createJob({
    actor: machinist,
    input: {
      customerName: "Floor demo customer (demo)", engineDescription: "twin, 94 mm grey-iron bores (demo floor job)", boreMaterial: "grey_iron",
      cylinderCount: 2, standardBoreUm: 94_000, boreLengthUm: 140_000, bottomClearanceUm: 20_000, torquePlate: false, notes: NOTE,
    },
  });
  const cylinders = await listCylinders({ shopId, jobId });
  for (const [i, cylinder] of cylinders.entries()) {
    await createReadingSet({ actor: machinist, jobId, input: { cylinderId: cylinder.id, kind: "as_received", gauge: "dial bore gauge (demo)", temperatureC: 20, levels: BORES[i]! } });
    await createPiston({ actor: machinist, jobId, input: { cylinderId: cylinder.id, label: String(i + 1), diameterUm: 93_920, sizingHeightUm: 15_000, type: "forged", clearanceMinUm: 3.5 * THOU, clearanceMaxUm: 4.5 * THOU, notes: "Demo piston" } });
    await assignCylinder({ actor: machinist, jobId, cylinderId: cylinder.id, userId: userIdsByRole.apprentice });
  }
  const { planId } = await savePlanDraft({ actor: machinist, input: { mode: "job", jobId, machineId: machine.id, clearance: { minUm: 3.5 * THOU, maxUm: 4.5 * THOU, targetUm: 4 * THOU, performanceAllowanceUm: 0 } } });
  await releasePlan({ actor: lead, planId });
  return { planId };
}
