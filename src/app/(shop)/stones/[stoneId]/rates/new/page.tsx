import type { Metadata } from "next";
import Link from "next/link";
import { getStoneDetail } from "@/server/stones/queries";
import { Card, PageTitle } from "@/components/ui/card";
import { LibraryForm, type LibraryFormAction } from "@/components/stones/library-form";
import { createRateRowAction } from "../../../actions";
import { orNotFound, pageActor } from "../../../_components/page-actor";
import { rateFieldSpecs } from "../../../_components/field-specs";
import { viewerUnits } from "../../../_components/units";

export const metadata: Metadata = { title: "Add rate row" };

export default async function NewRatePage({ params }: { params: Promise<{ stoneId: string }> }) {
  const { stoneId } = await params;
  const actor = await pageActor("stones.edit");
  const [{ stone }, units] = await Promise.all([orNotFound(getStoneDetail({ actor, stoneId })), viewerUnits(actor)]);
  return (
    <div className="flex flex-col gap-6">
      <Link href={`/stones/${stone.id}`} className="text-steel underline">← {stone.code}</Link>
      <PageTitle>Add a rate row for {stone.code} <span className="text-ink-soft num">{stone.gritLabel}</span></PageTitle>
      <Card>
        <LibraryForm action={createRateRowAction as LibraryFormAction} fields={rateFieldSpecs(undefined, true, units)} hidden={{ stoneId: stone.id }} submitLabel="Add rate row" testId="rate-form" />
      </Card>
    </div>
  );
}
