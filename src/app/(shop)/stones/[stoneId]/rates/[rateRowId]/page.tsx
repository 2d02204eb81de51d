import type { Metadata } from "next";
import Link from "next/link";
import { boreMaterialLabel } from "@/lib/bore-materials";
import { notFound } from "next/navigation";
import { getStoneDetail } from "@/server/stones/queries";
import { Card, PageTitle } from "@/components/ui/card";
import { LibraryForm, type LibraryFormAction } from "@/components/stones/library-form";
import { updateRateRowAction } from "../../../actions";
import { orNotFound, pageActor } from "../../../_components/page-actor";
import { rateFieldSpecs, reasonField } from "../../../_components/field-specs";
import { viewerUnits } from "../../../_components/units";

export const metadata: Metadata = { title: "Edit rate row" };

export default async function EditRatePage({ params }: { params: Promise<{ stoneId: string; rateRowId: string }> }) {
  const { stoneId, rateRowId } = await params;
  const actor = await pageActor("stones.edit");
  const [{ stone, rates }, units] = await Promise.all([orNotFound(getStoneDetail({ actor, stoneId })), viewerUnits(actor)]);
  const rate = rates.find((r) => r.id === rateRowId);
  if (!rate) notFound();
  return (
    <div className="flex flex-col gap-6">
      <Link href={`/stones/${stone.id}`} className="text-steel underline">← {stone.code}</Link>
      <PageTitle>
        {stone.code} on {boreMaterialLabel(rate.boreMaterial)} <span className="text-ink-soft num">(version {rate.version})</span>
      </PageTitle>
      <Card>
        <LibraryForm
          action={updateRateRowAction as LibraryFormAction}
          fields={[...rateFieldSpecs(rate, false, units), reasonField()]}
          hidden={{ rateRowId: rate.id, expectedVersion: String(rate.version) }}
          submitLabel="Save as a new version"
          testId="rate-form"
        />
      </Card>
    </div>
  );
}
