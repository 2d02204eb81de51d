import type { Metadata } from "next";
import { Card, PageTitle } from "@/components/ui/card";
import { LibraryForm } from "@/components/stones/library-form";
import { updateStoneAction } from "../../actions";
import { BackToStone, loadStoneToEdit } from "../../_components/editor-page";
import { reasonField, stoneFieldSpecs } from "@/components/stones/field-specs";
import { ActiveForm } from "../../_components/active-form";

export const metadata: Metadata = { title: "Edit stone set" };

export default async function EditStonePage({ params }: { params: Promise<{ stoneId: string }> }) {
  const { stoneId } = await params;
  const { stone, units } = await loadStoneToEdit(stoneId);
  return (
    <div className="flex flex-col gap-6">
      <BackToStone stone={stone} />
      <PageTitle>Edit {stone.code} <span className="text-ink-soft num">(version {stone.version})</span></PageTitle>
      <Card>
        <LibraryForm
          action={updateStoneAction}
          fields={[...stoneFieldSpecs(stone, units), reasonField()]}
          hidden={{ stoneId: stone.id, expectedVersion: String(stone.version) }}
          submitLabel="Save as a new version"
          testId="stone-form"
        />
      </Card>
      <Card title={stone.active ? "Retire this stone set" : "Bring this stone set back"}>
        <ActiveForm stoneId={stone.id} active={stone.active} />
      </Card>
    </div>
  );
}
