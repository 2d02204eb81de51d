import Link from "next/link";
import { Card } from "@/components/ui/card";
import type { Actor } from "@/shared/auth/policy";
import { listPlansAwaitingRelease } from "@/server/plans/queries";
import { dateText } from "@/shared/time";
import { shopTimeZone } from "@/server/shop-settings/time-zone";

/** Draft plans with no errors, waiting for a lead to release them to the floor. */
export async function PlansAwaitingRelease({ actor }: { actor: Actor }) {
  const plans = await listPlansAwaitingRelease({ actor });
  const zone = await shopTimeZone(actor);
  return (
    <Card title="Plans waiting for release">
      {plans.length === 0 ? (
        <p className="text-ink-soft">No draft plan is waiting.</p>
      ) : (
        <ul className="flex flex-col divide-y divide-rule" data-testid="dashboard-plans-awaiting">
          {plans.map((p) => (
            <li key={p.id} className="flex flex-wrap items-center gap-x-3 py-2">
              <Link href={`/jobs/${p.jobId}/plans/${p.id}`} className="num min-h-touch content-center font-semibold text-steel underline">
                #{p.jobNumber}
              </Link>
              <span>{p.engineDescription}</span>
              <span className="ml-auto text-caption text-ink-soft">
                by {p.createdByName ?? "a former member"}, <span className="num">{dateText(p.createdAt, zone)}</span>
              </span>
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
