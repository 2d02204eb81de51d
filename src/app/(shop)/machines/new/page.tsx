import type { Metadata } from "next";
import Link from "next/link";
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
      <Link href="/machines" className="self-start inline-flex min-h-[24px] min-w-[24px] items-center text-steel underline">← Machines</Link>
      <PageTitle>Add machine</PageTitle>
      <Card>
        <LibraryForm action={createMachineAction} fields={machineFieldSpecs(undefined, units)} submitLabel="Add machine" testId="machine-form" />
      </Card>
    </div>
  );
}
