import type { Metadata } from "next";
import { BackLink } from "@/components/ui/back-link";
import { Card, PageTitle } from "@/components/ui/card";
import { LibraryForm } from "@/components/stones/library-form";
import { createStoneAction } from "../actions";
import { pageActor } from "@/server/http/page";
import { stoneFieldSpecs } from "@/components/stones/field-specs";
import { viewerUnits } from "@/server/units";

export const metadata: Metadata = { title: "Add stone set" };

export default async function NewStonePage() {
  const actor = await pageActor("stones.edit", "/stones");
  const units = await viewerUnits(actor);
  return (
    <div className="flex flex-col gap-6">
      <BackLink href="/stones">Stone library</BackLink>
      <PageTitle>Add stone set</PageTitle>
      <Card>
        <LibraryForm action={createStoneAction} fields={stoneFieldSpecs(undefined, units)} submitLabel="Add stone set" testId="stone-form" />
      </Card>
    </div>
  );
}
