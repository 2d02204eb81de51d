import type { Metadata } from "next";
import { BackLink } from "@/components/ui/back-link";
import { Card, PageTitle } from "@/components/ui/card";
import { LibraryForm } from "@/components/stones/library-form";
import { pageActor } from "@/server/http/page";
import { createMachineAction } from "../actions";
import { machineFieldSpecs } from "@/components/stones/machine-fields";
import { viewerUnits } from "@/server/units";

export const metadata: Metadata = { title: "Add machine" };

export default async function NewMachinePage() {
  const actor = await pageActor("machines.edit", "/machines");
  const units = await viewerUnits(actor);
  return (
    <div className="flex flex-col gap-6">
      <BackLink href="/machines">Machines</BackLink>
      <PageTitle>Add machine</PageTitle>
      <Card>
        <LibraryForm action={createMachineAction} fields={machineFieldSpecs(undefined, units)} submitLabel="Add machine" testId="machine-form" />
      </Card>
    </div>
  );
}
