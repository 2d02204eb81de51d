import "server-only";
import { can, type Actor } from "@/shared/auth/policy";
import { getShopSettings } from "@/server/shop-settings/queries";
import { sequenceRatesFor } from "@/server/stones/rate-inputs";
import { listReadingSets } from "@/server/readings/queries";
import { listPistons } from "@/server/pistons/queries";
import { listAttachments } from "@/server/uploads/queries";
import { mayEnterReadings, loadJob } from "./access";
import { getJob, getUnitSystem, listCylinders, listShopMembers } from "./queries";
import { intakeSummary } from "./summary";
import { displayUnits } from "@/shared/units";
import { FLOOR_READING_KINDS, READING_KINDS } from "@/shared/jobs/constants";
import { env } from "@/env";
import { getShopTimeZone } from "@/server/shop-settings/time-zone";

/** Everything the job page shows, in one response; the page's SWR key and the GET route share it. */
export async function getJobDetail({ actor, jobId }: { actor: Actor; jobId: string }) {
  const job = await getJob({ actor, jobId });
  const row = await loadJob({ actor, jobId });
  const [cylinders, sets, pistons, files, settings, unitSystem, members, sequence, timeZone] = await Promise.all([
    listCylinders({ shopId: actor.shopId, jobId }),
    listReadingSets({ shopId: actor.shopId, jobId }),
    listPistons({ shopId: actor.shopId, jobId }),
    listAttachments({ shopId: actor.shopId, jobId }),
    getShopSettings({ shopId: actor.shopId }),
    getUnitSystem({ userId: actor.userId }),
    listShopMembers({ actor }),
    sequenceRatesFor({ actor, boreMaterial: job.boreMaterial }),
    getShopTimeZone({ shopId: actor.shopId }),
  ]);
  const units = displayUnits(unitSystem);
  const summary = intakeSummary({ job, cylinders, sets, pistons, settings, units, sequence });
  const readingKindsByCylinder = Object.fromEntries(
    cylinders.map((c) => [c.id, READING_KINDS.filter((k) => mayEnterReadings(actor, row, c, k))]),
  );
  return {
    job,
    cylinders,
    readingSets: sets,
    pistons,
    attachments: files,
    settings,
    unitSystem,
    units,
    timeZone,
    members,
    summary,
    /** The byte limit the attachment upload applies, stated by its file picker. */
    uploadMaxBytes: env.UPLOAD_MAX_BYTES,
    permissions: {
      editJob: can(actor, "jobs.edit"),
      setStatus: can(actor, "jobs.setStatus"),
      editPistons: can(actor, "pistons.edit"),
      deleteReadings: can(actor, "readings.edit"),
      upload: can(actor, "attachments.upload"),
      importCsv: can(actor, "readings.edit"),
      floorKinds: FLOOR_READING_KINDS,
      readingKindsByCylinder,
    },
  };
}
export type JobDetail = Awaited<ReturnType<typeof getJobDetail>>;
