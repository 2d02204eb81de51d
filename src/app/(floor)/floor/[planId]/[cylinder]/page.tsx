import { notFound } from "next/navigation";
import { BackLink } from "@/components/ui/back-link";
import { env } from "@/env";
import { StepCards } from "@/components/floor/step-cards";
import { CardView } from "@/components/floor/card-view";
import { getViewer } from "@/server/auth/current";
import { orNotFound, pageActor } from "@/server/http/page";
import { floorCylinderData } from "@/server/runs/cards-data";

export const metadata = { title: "Step cards" };

// Printed, the page is every card of this cylinder on its own sheet(s), for shops that prefer paper.
const PRINT_CSS = `@media print {
  @page { size: A4; margin: 12mm; }
  .no-print, [data-testid="step-cards"] { display: none !important; }
  .print-cards { display: flex !important; }
  .print-cards .step-card { break-inside: avoid; border: 1px solid #999 !important; }
}`;

export default async function StepCardsPage({ params }: { params: Promise<{ planId: string; cylinder: string }> }) {
  const { planId, cylinder } = await params;
  const number = Number(cylinder);
  if (!Number.isInteger(number) || number < 1 || number > 24) notFound();
  const actor = await pageActor("floor.view");
  const viewer = (await getViewer())!;
  const data = await orNotFound(floorCylinderData({ actor, planId, cylinder: number, unitSystem: viewer.user.unitSystem }));
  return (
    <>
      <style>{PRINT_CSS}</style>
      <BackLink href="/floor" touch>At the machine: all my cylinders</BackLink>
      <StepCards data={data} uploadMaxBytes={env.UPLOAD_MAX_BYTES} />
      <div className="print-cards hidden flex-col gap-3">
        <h1 className="text-title">{data.heading}</h1>
        {data.cards.map((card, i) => <CardView key={card.key} card={card} step={i + 1} of={data.cards.length} print />)}
      </div>
    </>
  );
}
