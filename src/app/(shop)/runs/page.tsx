import type { Metadata } from "next";
import Link from "next/link";
import { pageActor } from "@/server/http/page";
import { viewerUnits } from "@/server/units";
import { listPredictions, listRunLog, runLogChoices } from "@/server/run-log/queries";
import { capabilityDefaults, getCapability } from "@/server/run-log/capability";
import { PageTitle, Card } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { runLogHref, runLogSchema } from "@/shared/runs/log-schema";
import { RunFilters } from "./_components/run-filters";
import { RunTable } from "./_components/run-table";
import { PredictionCard } from "./_components/prediction-card";
import { CapabilityCard } from "./_components/capability-card";
import { shopTimeZone } from "@/server/shop-settings/time-zone";

export const metadata: Metadata = { title: "Run log" };

export default async function RunsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const actor = await pageActor("runs.view");
  const raw = Object.fromEntries(Object.entries(await searchParams).filter((e): e is [string, string] => typeof e[1] === "string"));
  const parsed = runLogSchema.safeParse(raw);
  const choices = await runLogChoices({ actor });
  if (!parsed.success) {
    return (
      <>
        <PageTitle>Run log</PageTitle>
        <Notice tone="caution" title="These filters could not be read">
          <ul className="list-disc pl-5" data-testid="filter-errors">{parsed.error.issues.map((i) => <li key={`${i.path.join(".")}${i.message}`}>{i.message}</li>)}</ul>
          <Link href="/runs" className="text-steel underline">Show every run</Link>
        </Notice>
        <RunFilters choices={choices} values={raw} />
      </>
    );
  }
  const query = parsed.data;
  const defaults = await capabilityDefaults({ actor, machineId: query.machine, boreMaterial: query.material });
  const [page, points, units, zone, capability] = await Promise.all([
    listRunLog({ actor, query }),
    listPredictions({ actor, query }),
    viewerUnits(actor),
    shopTimeZone(actor),
    defaults ? getCapability({ actor, ...defaults, bores: query.bores }) : Promise.resolve(null),
  ]);
  const kept = { ...query, after: undefined };
  return (
    <div className="flex flex-col gap-6">
      <PageTitle>Run log</PageTitle>
      <RunFilters choices={choices} values={raw} />
      <Card title="Runs">
        <RunTable rows={page.rows} units={units} timeZone={zone} />
        <nav className="mt-3 flex flex-wrap gap-4" aria-label="Pages of the run log">
          {query.after ? <Link href={runLogHref(kept)} className="min-h-touch inline-flex items-center text-steel underline">Newest runs</Link> : null}
          {page.next ? <Link href={runLogHref({ ...kept, after: page.next })} className="min-h-touch inline-flex items-center text-steel underline" data-testid="older-runs">Older runs →</Link> : null}
        </nav>
      </Card>
      <PredictionCard points={points} timeZone={zone} />
      <CapabilityCard view={capability} units={units} />
    </div>
  );
}
