import type { Metadata } from "next";
import Link from "next/link";
import { can } from "@/shared/auth/policy";
import { listMachines } from "@/server/machines/queries";
import { PageTitle } from "@/components/ui/card";
import { buttonClass } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { pageActor } from "@/server/http/page";
import { MachineCard } from "./_components/machine-card";
import { viewerUnits } from "@/server/units";

export const metadata: Metadata = { title: "Machines" };

export default async function MachinesPage() {
  const actor = await pageActor();
  const [machines, units] = await Promise.all([listMachines({ actor }), viewerUnits(actor)]);
  const canEdit = can(actor, "machines.edit");
  return (
    <div className="flex flex-col gap-6">
      <PageTitle actions={canEdit ? <Link href="/machines/new" className={buttonClass("primary")} data-testid="add-machine">Add machine</Link> : null}>Machines</PageTitle>
      <Notice tone="caution" title="Before you set speeds">
        The plan proposes speeds inside these ranges only. The machine maker&apos;s manual and your shop&apos;s safety rules come first: guards closed, spindle stopped before gauging or changing stones.
      </Notice>
      {machines.length === 0 ? <p className="text-ink-soft">No machines yet.</p> : (
        <div className="grid gap-4 lg:grid-cols-2">
          {machines.map((m) => <MachineCard key={m.id} machine={m} canEdit={canEdit} units={units} />)}
        </div>
      )}
    </div>
  );
}
