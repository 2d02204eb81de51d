import "server-only";
import { boreMaterialLabel } from "@/lib/bore-materials";
import { commonClearanceBand, DEFAULT_CHECKPOINT_FRACTION, DEFAULT_CROSSHATCH_DEG } from "@/lib/honing";
import { assertCan } from "@/server/auth/guard";
import { can, type Actor } from "@/shared/auth/policy";
import { loadJob } from "@/server/jobs/access";
import { listCylinders } from "@/server/jobs/queries";
import { listPistons } from "@/server/pistons/queries";
import { defaultClearance } from "./cylinders";
import { listActiveMachines } from "./library";
import type { JobPlanDraft } from "@/shared/plans/schema";
import { getShopTimeZone } from "@/server/shop-settings/time-zone";

/** What the wizard page needs before the first preview: the job, its pistons and the machines. */
export async function getWizardContext({ actor, jobId }: { actor: Actor; jobId: string }) {
  assertCan(actor, "plans.create");
  const job = await loadJob({ actor, jobId });
  const [cylinders, pistons, machines, timeZone] = await Promise.all([
    listCylinders({ shopId: actor.shopId, jobId: job.id }),
    listPistons({ shopId: actor.shopId, jobId: job.id }),
    listActiveMachines({ actor }),
    getShopTimeZone({ shopId: actor.shopId }),
  ]);
  const numberOf = (cylinderId: string | null) => cylinders.find((c) => c.id === cylinderId)?.number ?? null;
  const band = commonClearanceBand(pistons);
  const initialDraft: JobPlanDraft = {
    mode: "job", jobId: job.id, machineId: machines[0]?.id ?? "",
    // The band every piston allows (the intake sizes with the same); with none, the machinist types it.
    clearance: band ? defaultClearance(band) : { minUm: Number.NaN, maxUm: Number.NaN, targetUm: null, performanceAllowanceUm: 0 },
    cylinders: cylinders.map((c) => ({ cylinder: c.number, bore: { kind: "readings" } })),
    stoneIds: {}, pressures: {}, checkpointFraction: DEFAULT_CHECKPOINT_FRACTION, targetCrosshatchDeg: DEFAULT_CROSSHATCH_DEG,
    boring: { enabled: null, marginUm: null },
  };
  return {
    job: {
      id: job.id, number: job.number, engineDescription: job.engineDescription, boreMaterialLabel: boreMaterialLabel(job.boreMaterial),
      cylinderCount: job.cylinderCount, boreLengthUm: job.boreLengthUm, standardBoreUm: job.standardBoreUm,
    },
    pistons: pistons.map((p) => ({ id: p.id, label: p.label, diameterUm: p.diameterUm, cylinderNumber: numberOf(p.cylinderId), clearanceMinUm: p.clearanceMinUm, clearanceMaxUm: p.clearanceMaxUm })),
    machines: machines.map((m) => ({ id: m.id, name: m.name })),
    mayRelease: can(actor, "plans.release"),
    timeZone,
    initialDraft,
  };
}
export type WizardContext = Awaited<ReturnType<typeof getWizardContext>>;
