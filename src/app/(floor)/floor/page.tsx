import Link from "next/link";
import { SendStatus } from "@/components/floor/send-status";
import { pageActor } from "@/server/http/page";
import { listFloorQueue } from "@/server/runs/queue";
import { CYLINDER_STATE_LABELS, type CylinderProgress } from "@/shared/floor/outcome";

export const metadata = { title: "Floor" };

const TONE: Record<CylinderProgress["state"], string> = {
  not_started: "bg-paper-sunk text-ink", in_stage: "bg-steel-light text-steel-dark", waiting_reading: "bg-caution-light text-caution",
  stopped: "bg-stop-light text-stop", inspect: "bg-steel-light text-steel-dark", passed: "bg-pass-light text-pass", failed: "bg-stop-light text-stop",
};

function where(p: CylinderProgress): string {
  const label = CYLINDER_STATE_LABELS[p.state];
  return p.stageNumber !== null && p.state !== "not_started" ? `${label} · stage ${p.stageNumber} of ${p.stageCount}` : label;
}

export default async function FloorQueuePage() {
  const actor = await pageActor("floor.view");
  const queue = await listFloorQueue({ actor });
  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-title">At the machine</h1>
        <SendStatus />
      </div>
      {queue.length === 0 ? <p className="text-lead text-ink-soft" data-testid="floor-empty">No released plan has cylinders for you yet.</p> : null}
      {queue.map((job) => (
        <section key={job.planId} className="rounded-lg border border-rule bg-paper-raised p-4" data-testid={`floor-job-${job.jobNumber}`}>
          <h2 className="text-lead font-semibold">Job #{job.jobNumber} · {job.engineDescription}</h2>
          <ul className="mt-3 grid gap-3 sm:grid-cols-2">
            {job.cylinders.map((c) => (
              <li key={c.number}>
                <Link href={`/floor/${job.planId}/${c.number}`} className="flex min-h-[64px] items-center justify-between gap-3 rounded-md border border-rule-strong px-4 py-3 hover:bg-paper-sunk" data-testid={`floor-cylinder-${job.jobNumber}-${c.number}`}>
                  <span className="text-title">Cylinder {c.number}</span>
                  <span className={`rounded-md px-2 py-1 text-body font-semibold ${TONE[c.progress.state]}`}>{where(c.progress)}</span>
                </Link>
                {c.assignee ? <p className="mt-1 text-caption text-ink-soft">Assigned to {c.assignee}</p> : null}
              </li>
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}
