import type { Metadata } from "next";
import { BackLink } from "@/components/ui/back-link";
import { getMachine } from "@/server/machines/queries";
import { Card, PageTitle } from "@/components/ui/card";
import { LibraryForm } from "@/components/stones/library-form";
import { orNotFound, pageActor } from "@/server/http/page";
import { setMachineActiveAction, updateMachineAction } from "../actions";
import { machineFieldSpecs } from "@/components/stones/machine-fields";
import { viewerUnits } from "@/server/units";

export const metadata: Metadata = { title: "Edit machine" };

export default async function MachinePage({ params }: { params: Promise<{ machineId: string }> }) {
  const { machineId } = await params;
  const actor = await pageActor("machines.edit", "/machines");
  const [machine, units] = await Promise.all([orNotFound(getMachine({ actor, machineId })), viewerUnits(actor)]);
  return (
    <div className="flex flex-col gap-6">
      <BackLink href="/machines">Machines</BackLink>
      <PageTitle>{machine.name}</PageTitle>
      <Card>
        <LibraryForm action={updateMachineAction} fields={machineFieldSpecs(machine, units)} hidden={{ machineId }} submitLabel="Save machine" testId="machine-form" />
      </Card>
      <Card title={machine.active ? "Retire this machine" : "Bring this machine back"}>
        <p className="mb-3 text-caption text-ink-soft">A retired machine stays on record for the plans and runs that name it, but new plans cannot choose it.</p>
        <LibraryForm
          action={setMachineActiveAction}
          fields={[]}
          hidden={{ machineId, active: machine.active ? "false" : "true" }}
          submitLabel={machine.active ? "Retire machine" : "Bring back into service"}
          testId="machine-active-form"
        />
      </Card>
    </div>
  );
}
