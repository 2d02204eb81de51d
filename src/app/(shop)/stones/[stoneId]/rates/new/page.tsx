import type { Metadata } from "next";
import { Card, PageTitle } from "@/components/ui/card";
import { LibraryForm } from "@/components/stones/library-form";
import { createRateRowAction } from "../../../actions";
import { BackToStone, loadStoneToEdit } from "../../../_components/editor-page";
import { rateFieldSpecs } from "@/components/stones/field-specs";

export const metadata: Metadata = { title: "Add rate row" };

export default async function NewRatePage({ params }: { params: Promise<{ stoneId: string }> }) {
  const { stoneId } = await params;
  const { stone, units } = await loadStoneToEdit(stoneId);
  return (
    <div className="flex flex-col gap-6">
      <BackToStone stone={stone} />
      <PageTitle>Add a rate row for {stone.code} <span className="text-ink-soft num">{stone.gritLabel}</span></PageTitle>
      <Card>
        <LibraryForm action={createRateRowAction} fields={rateFieldSpecs(undefined, true, units)} hidden={{ stoneId: stone.id }} submitLabel="Add rate row" testId="rate-form" />
      </Card>
    </div>
  );
}
