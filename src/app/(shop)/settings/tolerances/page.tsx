import type { Metadata } from "next";
import { BackLink } from "@/components/ui/back-link";
import { pageActor } from "@/server/http/page";
import { PageTitle } from "@/components/ui/card";
import { TolerancesForm } from "@/components/jobs/tolerances-form";
import { can } from "@/shared/auth/policy";
import { getUnitSystem } from "@/server/jobs/queries";
import { displayUnits } from "@/shared/units";
import { getShopSettings } from "@/server/shop-settings/queries";
import { saveFloorSettingsAction, saveTolerancesAction } from "./actions";
import { FloorSettingsForm } from "@/components/floor/floor-settings-form";
import { getFloorSettings } from "@/server/shop-settings/floor";

export const metadata: Metadata = { title: "Tolerances and oversizes" };

export default async function TolerancesPage() {
  const actor = await pageActor();
  const [settings, unitSystem, floor] = await Promise.all([getShopSettings({ shopId: actor.shopId }), getUnitSystem({ userId: actor.userId }), getFloorSettings({ shopId: actor.shopId })]);
  return (
    <>
      <BackLink href="/settings">Settings</BackLink>
      <PageTitle>Tolerances, oversizes and reading levels</PageTitle>
      <p className="mb-4 max-w-3xl text-ink-soft">
        The reading grid and the intake summary mark any taper or out-of-round above these figures. The oversize proposal picks the
        smallest step that cleans up the worst bore with the honing allowance left.
      </p>
      <TolerancesForm settings={settings} units={displayUnits(unitSystem)} canEdit={can(actor, "shop.edit")} save={saveTolerancesAction} />
      <h2 className="mb-2 mt-8 text-lead font-semibold">At the machine: temperatures</h2>
      <FloorSettingsForm settings={floor} canEdit={can(actor, "floor.settings")} save={saveFloorSettingsAction} />
    </>
  );
}
