import type { Metadata } from "next";
import { BackLink } from "@/components/ui/back-link";
import { LogoForm } from "@/components/records/logo-form";
import { RecordSettingsForm } from "@/components/records/record-settings-form";
import { Card, PageTitle } from "@/components/ui/card";
import { pageActor } from "@/server/http/page";
import { getRecordSettings } from "@/server/records/settings";
import { removeLogoAction, updateRecordSettingsAction } from "./actions";

export const metadata: Metadata = { title: "Machining record settings" };

export default async function RecordSettingsPage() {
  const actor = await pageActor("shop.edit", "/settings");
  const values = await getRecordSettings({ actor });
  return (
    <div className="flex flex-col gap-6">
      <BackLink href="/settings">Settings</BackLink>
      <PageTitle>Machining record</PageTitle>
      <Card title="What every record says about the shop" className="max-w-2xl">
        <RecordSettingsForm action={updateRecordSettingsAction} values={values} />
      </Card>
      <Card title="The shop's logo" className="max-w-2xl">
        <LogoForm hasLogo={values.hasLogo} logoVersion={values.logoVersion} remove={removeLogoAction} />
      </Card>
    </div>
  );
}
