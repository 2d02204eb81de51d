import Link from "next/link";
import { RevokeLinkButton } from "@/components/records/revoke-link-button";
import { buttonClass } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { can, type Actor } from "@/shared/auth/policy";
import { listRecordVersions } from "@/server/records/queries";
import { revokeRecordLinkAction } from "../record/actions";
import { dateTimeText } from "@/shared/time";
import { shopTimeZone } from "@/server/shop-settings/time-zone";

const STATE_TONE = { active: "bg-pass-light text-pass", expired: "bg-paper-sunk text-ink-soft", revoked: "bg-stop-light text-stop" } as const;

/** Every machining record sent for the job, newest first: to whom, when, its PDF and its customer link. */
export async function RecordsPanel({ actor, jobId, jobStatus }: { actor: Actor; jobId: string; jobStatus: string }) {
  const versions = await listRecordVersions({ actor, jobId });
  const zone = await shopTimeZone(actor);
  const when = (iso: string) => dateTimeText(iso, zone);
  const ready = jobStatus === "inspected" || jobStatus === "delivered";
  const open = ready ? (
    <Link href={`/jobs/${jobId}/record`} className={buttonClass(versions.length > 0 ? "secondary" : "primary")} data-testid="open-record">
      {versions.length > 0 ? "Open the record" : "Make the record"}
    </Link>
  ) : null;
  return (
    <Card title="Machining records" actions={open}>
      {versions.length === 0 ? (
        <p className="text-ink-soft">{ready ? "Not sent yet." : "The record can be made once every cylinder passed its final inspection."}</p>
      ) : (
        <ul className="flex flex-col divide-y divide-rule" data-testid="record-versions">
          {versions.map((v) => (
            <li key={v.id} className="flex flex-wrap items-center gap-x-4 gap-y-1 py-2">
              <span className="font-semibold">Version {v.version}</span>
              <span className="text-ink-soft">
                to {v.sentTo}, <span className="num">{when(v.sentAt)}</span> by {v.sentByName}, in {v.unitSystem === "inch" ? "inches" : "mm"}
              </span>
              <a href={`/api/jobs/${jobId}/records/${v.id}/pdf`} className="min-h-touch content-center font-semibold text-steel underline" data-testid={`record-pdf-${v.version}`}>
                PDF <span className="num">({Math.ceil(v.pdfBytes / 1024)} KB)</span>
              </a>
              {v.links.map((l) => (
                <span key={l.id} className="inline-flex items-center gap-2">
                  <span className={`rounded-full px-2 py-0.5 text-caption font-semibold ${STATE_TONE[l.state]}`} data-testid={`record-link-state-${v.version}`}>
                    link {l.state}{l.state === "active" ? ` until ${when(l.expiresAt)}` : ""}
                  </span>
                  {l.state === "active" && can(actor, "records.send") ? <RevokeLinkButton jobId={jobId} linkId={l.id} action={revokeRecordLinkAction} /> : null}
                </span>
              ))}
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
