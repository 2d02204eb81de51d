import type { Metadata } from "next";
import { BackLink } from "@/components/ui/back-link";
import Link from "next/link";
import { RecordSheet } from "@/components/records/record-sheet";
import { PrintButton } from "@/components/records/print-button";
import { SendRecordForm } from "@/components/records/send-record-form";
import { buttonClass } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { AppError } from "@/server/errors";
import { orNotFound, pageActor } from "@/server/http/page";
import { getRecordView, listRecordVersions } from "@/server/records/queries";
import { defaultRecordUnit, recordCustomerEmail } from "@/server/records/source";
import { can } from "@/shared/auth/policy";
import { UNIT_SYSTEMS, type UnitSystem } from "@/shared/units";
import { sendRecordAction } from "./actions";

export const metadata: Metadata = { title: "Machining record" };

async function recordOrReason(load: Promise<Awaited<ReturnType<typeof getRecordView>>>) {
  try {
    return { record: await load, reason: null };
  } catch (error) {
    if (error instanceof AppError && error.code === "conflict") return { record: null, reason: error.message };
    throw error;
  }
}

export default async function RecordPage({ params, searchParams }: { params: Promise<{ jobId: string }>; searchParams: Promise<{ units?: string }> }) {
  const { jobId } = await params;
  const { units } = await searchParams;
  const actor = await pageActor("jobs.view");
  const versions = await orNotFound(listRecordVersions({ actor, jobId }));
  // The sender may choose (?units=); otherwise the customer's unit decides.
  const unitSystem: UnitSystem = UNIT_SYSTEMS.includes(units as UnitSystem) ? (units as UnitSystem) : await defaultRecordUnit(actor, jobId, versions[0]?.unitSystem ?? null);
  const { record, reason } = await recordOrReason(orNotFound(getRecordView({ actor, jobId, unitSystem })));
  const back = <BackLink href={`/jobs/${jobId}`}>Back to the job</BackLink>;
  if (!record) {
    return (
      <Card title="Machining record" actions={back}>
        <p data-testid="record-refused">{reason}</p>
      </Card>
    );
  }
  const other = unitSystem === "metric" ? "inch" : "metric";
  return (
    <div className="flex flex-col gap-4">
      <div className="no-print flex flex-wrap items-center gap-2">
        {back}
        <Link href={`/jobs/${jobId}/record?units=${other}`} className={buttonClass("secondary")} data-testid="record-units">
          Show in {other === "inch" ? "inches" : "mm"}
        </Link>
        <a href={`/api/jobs/${jobId}/record/pdf?units=${unitSystem}`} className={buttonClass("secondary")} data-testid="record-pdf-preview">
          PDF preview
        </a>
        <PrintButton />
      </div>
      <div className="record-print-root">
        <RecordSheet record={record} logoSrc={record.shop.hasLogo ? "/api/settings/logo" : null} />
      </div>
      {can(actor, "records.send") ? (
        <Card title="Send to the customer" className="no-print max-w-xl">
          <SendRecordForm jobId={jobId} action={sendRecordAction} defaultTo={versions[0]?.sentTo ?? (await recordCustomerEmail(actor, jobId)) ?? ""} unitSystem={unitSystem} nextVersion={(versions[0]?.version ?? 0) + 1} />
        </Card>
      ) : null}
    </div>
  );
}
