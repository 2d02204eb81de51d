import type { Metadata } from "next";
import Link from "next/link";
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
      <Link href="/stones" className="inline-flex min-h-[24px] min-w-[24px] items-center text-steel underline">← Stone library</Link>
      <PageTitle>Add stone set</PageTitle>
      <Card>
        <LibraryForm action={createStoneAction} fields={stoneFieldSpecs(undefined, units)} submitLabel="Add stone set" testId="stone-form" />
      </Card>
    </div>
  );
}
