import Link from "next/link";
import { formatLength } from "@/lib/honing";
import { buttonClass } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { StatusBadge } from "@/components/jobs/status-badge";
import { can, type Actor } from "@/shared/auth/policy";
import { getUnitSystem, listDashboardJobs } from "@/server/jobs/queries";
import { displayUnits } from "@/shared/units";
import { PlansAwaitingRelease } from "./plans-awaiting-release";
import { StonesNearLimit } from "./stones-near-limit";
import { todayIn } from "@/shared/time";
import { shopTimeZone } from "@/server/shop-settings/time-zone";

type Row = Awaited<ReturnType<typeof listDashboardJobs>>["inWork"][number];

function daysUntil(date: string, today: string): number {
  return Math.round((Date.parse(`${date}T00:00:00Z`) - Date.parse(`${today}T00:00:00Z`)) / 86_400_000);
}

function dueText(date: string | null, today: string): { text: string; late: boolean } {
  if (!date) return { text: "no due date", late: false };
  const d = daysUntil(date, today);
  if (d < 0) return { text: `${-d} day${d === -1 ? "" : "s"} late`, late: true };
  if (d === 0) return { text: "due today", late: true };
  return { text: `due in ${d} day${d === 1 ? "" : "s"}`, late: false };
}

function JobRows({ rows, today, sizeUnit, testId, empty }: { rows: Row[]; today: string; sizeUnit: "mm" | "in"; testId: string; empty: string }) {
  if (rows.length === 0) return <p className="text-ink-soft">{empty}</p>;
  return (
    <ul className="flex flex-col divide-y divide-rule" data-testid={testId}>
      {rows.map((j) => {
        const due = dueText(j.dueDate, today);
        return (
          <li key={j.id} className="flex flex-wrap items-center gap-x-3 gap-y-1 py-2">
            <Link href={`/jobs/${j.id}`} className="num inline-flex min-h-touch min-w-[24px] items-center font-semibold text-steel underline">#{j.number}</Link>
            <span className="font-semibold">{j.customerName ?? "no customer"}</span>
            <span className="text-ink-soft">{j.engineDescription} · <span className="num">{j.cylinderCount}</span> × <span className="num">{formatLength(j.standardBoreUm, sizeUnit)}</span></span>
            <span className="ml-auto flex items-center gap-2">
              <StatusBadge status={j.status} />
              <span className={`num text-caption ${due.late ? "font-semibold text-stop" : "text-ink-soft"}`}>{due.text}</span>
            </span>
          </li>
        );
      })}
    </ul>
  );
}

// The signed-in home page (DESIGN.md §4): jobs in work and jobs due soon; stones near their wear limit.
export async function Dashboard({ actor }: { actor: Actor }) {
  const today = todayIn(await shopTimeZone(actor));
  const [{ inWork, dueSoon }, unitSystem] = await Promise.all([listDashboardJobs({ actor, days: 7 }), getUnitSystem({ userId: actor.userId })]);
  const sizeUnit = unitSystem === "inch" ? "in" : "mm";
  return (
    <div data-testid="dashboard" className="flex flex-col gap-6">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-title">Shop dashboard</h1>
        <div className="ml-auto flex gap-2">
          <Link href="/jobs" className={buttonClass("secondary")}>All jobs</Link>
          {can(actor, "jobs.create") ? <Link href="/jobs/new" className={buttonClass()}>New job</Link> : null}
        </div>
      </div>
      <div className="grid gap-4 lg:grid-cols-2">
        <Card title="In work">
          <JobRows rows={inWork} today={today} sizeUnit={sizeUnit} testId="dashboard-in-work" empty="No job is in work." />
        </Card>
        <Card title="Due in the next 7 days (and late)">
          <JobRows rows={dueSoon} today={today} sizeUnit={sizeUnit} testId="dashboard-due-soon" empty="Nothing due this week." />
        </Card>
      </div>
      <div className="grid gap-4 lg:grid-cols-2">
        {can(actor, "plans.release") ? <PlansAwaitingRelease actor={actor} /> : null}
        {can(actor, "stones.view") ? <StonesNearLimit actor={actor} units={displayUnits(unitSystem)} /> : null}
      </div>
    </div>
  );
}
