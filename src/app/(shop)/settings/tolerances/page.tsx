import type { Metadata } from "next";
import { pageActor } from "@/server/http/page";
import { PageTitle } from "@/components/ui/card";
import { TolerancesForm } from "@/components/jobs/tolerances-form";
import { can } from "@/shared/auth/policy";
import { getUnitSystem } from "@/server/jobs/queries";
import { displayUnits } from "@/shared/units";
import { getShopSettings } from "@/server/shop-settings/queries";
import { saveTolerancesAction } from "./actions";

export const metadata: Metadata = { title: "Tolerances and oversizes" };

export default async function TolerancesPage() {
  const actor = await pageActor();
  const [settings, unitSystem] = await Promise.all([getShopSettings({ shopId: actor.shopId }), getUnitSystem({ userId: actor.userId })]);
  return (
    <>
      <PageTitle>Tolerances, oversizes and reading levels</PageTitle>
      <p className="mb-4 max-w-3xl text-ink-soft">
        The reading grid and the intake summary mark any taper or out-of-round above these figures. The oversize proposal picks the
        smallest step that cleans up the worst bore with the honing allowance left.
      </p>
      <TolerancesForm settings={settings} units={displayUnits(unitSystem)} canEdit={can(actor, "shop.edit")} save={saveTolerancesAction} />
    </>
  );
}
