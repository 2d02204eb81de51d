import type { Metadata } from "next";
import { boreMaterialLabel } from "@/lib/bore-materials";
import { notFound } from "next/navigation";
import { Card, PageTitle } from "@/components/ui/card";
import { LibraryForm } from "@/components/stones/library-form";
import { updateRateRowAction } from "../../../actions";
import { BackToStone, loadStoneToEdit } from "../../../_components/editor-page";
import { rateFieldSpecs, reasonField } from "@/components/stones/field-specs";

export const metadata: Metadata = { title: "Edit rate row" };

export default async function EditRatePage({ params }: { params: Promise<{ stoneId: string; rateRowId: string }> }) {
  const { stoneId, rateRowId } = await params;
  const { stone, rates, units } = await loadStoneToEdit(stoneId);
  const rate = rates.find((r) => r.id === rateRowId);
  if (!rate) notFound();
  return (
    <div className="flex flex-col gap-6">
      <BackToStone stone={stone} />
      <PageTitle>
        {stone.code} on {boreMaterialLabel(rate.boreMaterial)} <span className="text-ink-soft num">(version {rate.version})</span>
      </PageTitle>
      <Card>
        <LibraryForm
          action={updateRateRowAction}
          fields={[...rateFieldSpecs(rate, false, units), reasonField()]}
          hidden={{ rateRowId: rate.id, expectedVersion: String(rate.version) }}
          submitLabel="Save as a new version"
          testId="rate-form"
        />
      </Card>
    </div>
  );
}
