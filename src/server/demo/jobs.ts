import "server-only";
import type { Actor } from "@/shared/auth/policy";
import { createCustomer } from "@/server/customers/mutations";
import { assignCylinder, createJob, setJobStatus } from "@/server/jobs/mutations";
import { listCylinders } from "@/server/jobs/queries";
import { createReadingSet } from "@/server/readings/mutations";
import { createPiston } from "@/server/pistons/mutations";
import type { DemoContext } from "./seed";

// Invented demo data (DESIGN.md §9): generic engines, invented customers, every figure made up for the
// demo. Nothing here is a real engine, maker or person.
const DEMO_NOTE = "Demo data: invented for the Borewise demo shop.";

const daysFromNow = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

/** As-received readings (µm) of a worn 92 mm bore: wear is largest near the top of ring travel. */
const SIX_BORES: Array<{ top: [number, number]; middle: [number, number]; bottom: [number, number] }> = [
  { top: [92_046, 92_038], middle: [92_031, 92_027], bottom: [92_018, 92_016] },
  { top: [92_052, 92_041], middle: [92_034, 92_029], bottom: [92_019, 92_017] },
  { top: [92_058, 92_047], middle: [92_039, 92_033], bottom: [92_021, 92_018] },
  { top: [92_049, 92_040], middle: [92_032, 92_028], bottom: [92_017, 92_016] },
  { top: [92_071, 92_055], middle: [92_044, 92_036], bottom: [92_022, 92_019] },
  { top: [92_044, 92_037], middle: [92_030, 92_026], bottom: [92_016, 92_015] },
];

/** Pistons for +0.25 mm, measured at the sizing point (invented figures). */
const PISTONS_UM = [92_201, 92_198, 92_204, 92_199, 92_202, 92_200];

async function seedSixCylinderJob(machinist: Actor, apprenticeId: string | undefined) {
  const customer = await createCustomer({ actor: machinist, input: { name: "Ridgeway Vintage Tractors (demo)", email: "workshop@ridgeway.demo.test", notes: DEMO_NOTE } });
  const { id: jobId } = await createJob({
    actor: machinist,
    input: {
      customerId: customer.id, engineDescription: "inline six, 3.4 L, grey-iron block, 92 mm standard bore", boreMaterial: "grey_iron",
      cylinderCount: 6, standardBoreUm: 92_000, boreLengthUm: 138_000, bottomClearanceUm: 14_000, wallThicknessUm: 4_600, minWallUm: 3_200,
      torquePlate: true, dueDate: daysFromNow(5), notes: `${DEMO_NOTE} Block arrived stripped and hot-tanked; customer wants a +0.25 mm rebore if it cleans up.`,
    },
  });
  const cylinders = await listCylinders({ shopId: machinist.shopId, jobId });
  for (const [i, cylinder] of cylinders.entries()) {
    const bore = SIX_BORES[i]!;
    const levels = (["top", "middle", "bottom"] as const).map((name) => ({ name, aUm: bore[name][0], bUm: bore[name][1] }));
    await createReadingSet({ actor: machinist, jobId, input: { cylinderId: cylinder.id, kind: "as_received", gauge: "dial bore gauge (demo)", temperatureC: 20, levels } });
    await createPiston({
      actor: machinist, jobId,
      input: { label: String(i + 1), diameterUm: PISTONS_UM[i]!, sizingHeightUm: 12_700, type: "cast", clearanceMinUm: 40, clearanceMaxUm: 60, notes: "Demo piston, +0.25 mm" },
    });
    if (apprenticeId && i >= 4) await assignCylinder({ actor: machinist, jobId, cylinderId: cylinder.id, userId: apprenticeId });
  }
  return jobId;
}

/**
 * After-boring readings (µm) of the four-cylinder job: bored to size, cylinder 3 left tight at the bottom,
 * the taper case the plan corrects with a dwell (invented figures).
 */
const FOUR_BORED: Array<[number, number, number]> = [
  [83_962, 83_961, 83_960],
  [83_961, 83_961, 83_960],
  [83_955, 83_950, 83_942],
  [83_962, 83_960, 83_959],
];
/** Standard-size pistons for the four-cylinder job, measured at the sizing point (invented figures). */
const FOUR_PISTONS_UM = [83_960, 83_961, 83_959, 83_960];

async function seedJobInWork(machinist: Actor) {
  const { id } = await createJob({
    actor: machinist,
    input: {
      customerName: "Harbour Launch Club (demo)", engineDescription: "inline four, 1.8 L marine, grey-iron block", boreMaterial: "grey_iron",
      cylinderCount: 4, standardBoreUm: 84_000, boreLengthUm: 112_000, torquePlate: false, dueDate: daysFromNow(2), notes: DEMO_NOTE,
    },
  });
  const cylinders = await listCylinders({ shopId: machinist.shopId, jobId: id });
  for (const [i, cylinder] of cylinders.entries()) {
    const [top, middle, bottom] = FOUR_BORED[i]!;
    const levels = [{ name: "top", aUm: top, bUm: top - 1 }, { name: "middle", aUm: middle, bUm: middle - 1 }, { name: "bottom", aUm: bottom, bUm: bottom - 1 }];
    await createReadingSet({ actor: machinist, jobId: id, input: { cylinderId: cylinder.id, kind: "after_boring", gauge: "dial bore gauge (demo)", temperatureC: 20, levels } });
    await createPiston({
      actor: machinist, jobId: id,
      input: { cylinderId: cylinder.id, label: String(i + 1), diameterUm: FOUR_PISTONS_UM[i]!, sizingHeightUm: 10_000, type: "cast", clearanceMinUm: 30, clearanceMaxUm: 50, notes: "Demo piston, standard size" },
    });
  }
  await setJobStatus({ actor: machinist, jobId: id, input: { status: "in_work" } });
}

/** The demo shop's jobs: a six-cylinder block measured on intake with pistons, and a small job in work. */
export async function seedDemoJobs(context: DemoContext): Promise<void> {
  const machinistId = context.userIdsByRole.machinist;
  if (!context.shopId || !machinistId) throw new Error("seedDemoJobs needs the demo shop and its machinist (accounts step first).");
  const machinist: Actor = { userId: machinistId, shopId: context.shopId, role: "machinist" };
  await seedSixCylinderJob(machinist, context.userIdsByRole.apprentice);
  await seedJobInWork(machinist);
}
