import Link from "next/link";
import { buttonClass } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { can, type Actor } from "@/shared/auth/policy";
import { listPlansForJob } from "@/server/plans/queries";
import { dateTimeText } from "@/shared/time";
import { shopTimeZone } from "@/server/shop-settings/time-zone";

const STATUS_TONE: Record<string, string> = {
  draft: "bg-paper-sunk text-ink",
  released: "bg-pass-light text-pass",
  done: "bg-steel-light text-steel-dark",
  withdrawn: "bg-paper-sunk text-ink-faint line-through",
};

/** The job's honing plans, newest first, with the way into the wizard. */
export async function JobPlansPanel({ actor, jobId }: { actor: Actor; jobId: string }) {
  const plans = await listPlansForJob({ actor, jobId });
  const zone = await shopTimeZone(actor);
  const action = can(actor, "plans.create") ? (
    <Link href={`/jobs/${jobId}/plan`} className={buttonClass()} data-testid="open-plan-wizard">
      Plan the honing
    </Link>
  ) : null;
  return (
    <Card title="Honing plans" actions={action}>
      {plans.length === 0 ? (
        <p className="text-ink-soft">No plan yet.</p>
      ) : (
        <ul className="flex flex-col divide-y divide-rule" data-testid="job-plans">
          {plans.map((p) => (
            <li key={p.id} className="flex flex-wrap items-center gap-3 py-2">
              <Link href={`/jobs/${jobId}/plans/${p.id}`} className="min-h-touch content-center font-semibold text-steel underline">
                Plan of <span className="num">{dateTimeText(p.createdAt, zone)}</span>
              </Link>
              <span className={`rounded-full px-2 py-0.5 text-caption font-semibold ${STATUS_TONE[p.status] ?? ""}`}>{p.status}</span>
              <span className="text-caption text-ink-soft">by {p.createdByName ?? "a former member"}</span>
              {!p.canRelease && p.status === "draft" ? <span className="text-caption text-stop">has errors to resolve before release</span> : null}
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
